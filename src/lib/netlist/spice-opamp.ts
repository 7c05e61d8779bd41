/**
 * Which node of an op-amp subcircuit call is which section pin.
 *
 * `opampRoles(portNames): { roles, assumed }`
 *
 * Rule: when every port name of the `.subckt` line falls in exactly one of the classes
 * below, and each class is met once, the names decide. Otherwise the common macromodel
 * order + − V+ V− out is assumed and reported (`assumed: true`, from memory: the order
 * most op-amp makers' SPICE models use); a note or override `pins=…` settles it.
 */
const CLASSES: [string, RegExp][] = [
  ['+', /^(\+|in\+|\+in|inp|in_?p|ip|plus|pos_?in|non_?inv(erting)?|ni|vin\+|vinp)$/],
  ['-', /^(-|in-|-in|inn|in_?n|im|minus|neg_?in|inv(erting)?|vin-|vinn)$/],
  ['out', /^(out|o|output|vout|vo)$/],
  ['V+', /^(v\+|vcc|vdd|vpos|vs\+|vsp|vplus|avdd|supply_?p)$/],
  ['V-', /^(v-|vee|vss|vneg|vs-|vsn|vminus|avss|supply_?n)$/],
];

export const OPAMP_DEFAULT_ORDER = ['+', '-', 'V+', 'V-', 'out'];

export function opampRoles(ports: string[] | undefined): { roles: string[]; assumed: boolean } {
  if (ports && ports.length === 5) {
    const roles = ports.map((p) => {
      const hits = CLASSES.filter(([, re]) => re.test(p.toLowerCase()));
      return hits.length === 1 ? hits[0]![0] : undefined;
    });
    if (roles.every((r) => r !== undefined) && new Set(roles).size === 5) return { roles: roles as string[], assumed: false };
  }
  return { roles: [...OPAMP_DEFAULT_ORDER], assumed: true };
}
