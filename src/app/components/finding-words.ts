/**
 * Short headings for findings in the checks list, by problem code. The message itself comes
 * from the module that found the problem; this only names the family it belongs to.
 */
const TITLES: [prefix: string, title: string][] = [
  ['verify.short', 'Short'],
  ['verify.open', 'Open'],
  ['verify.missing-part', 'Part missing'],
  ['verify.extra-part', 'Part not in circuit'],
  ['verify.missing-pin', 'Lead missing'],
  ['verify.off-board', 'Off the board'],
  ['verify.shared-hole', 'Two leads, one hole'],
  ['verify.lead-in-cut', 'Lead in a cut'],
  ['verify.geometry', 'Part shape'],
  ['verify.overlap', 'Bodies overlap'],
  ['route.', 'Cannot route'],
  ['part.', 'Circuit'],
  ['circuit.', 'Circuit'],
  ['packing.', 'Op-amp packing'],
  ['net.', 'Net'],
];

export function findingTitle(code: string): string {
  for (const [prefix, title] of TITLES) if (code.startsWith(prefix)) return title;
  const family = code.split('.')[1] ?? code;
  return family.replace(/-/g, ' ');
}
