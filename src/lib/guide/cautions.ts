/**
 * Bench cautions printed on the first page. Sources (check-values §12):
 * - extra-low voltage is ≤ 50 V AC rms or ≤ 120 V ripple-free DC (IEC 61140 / Electropedia [C]);
 *   stripboard gaps of ≈ 0.5 mm are far below the 1.25–2.5 mm IPC-2221 B2 asks at
 *   151–500 V peak (§7, §8 [D]), so no mains on stripboard [P];
 * - rosin flux fume is a leading cause of occupational asthma: extract, keep out of the
 *   plume, do not overheat (UK HSE guidance for solderers [C]);
 * - tin-lead solder: lead is toxic by ingestion, wash hands, no food or drink at the bench
 *   ([S]; Duke ECE teaching-lab rules [C]);
 * - eye protection when soldering and when clipping leads; iron back in its stand, work on
 *   a non-flammable surface; tips run near 400 °C (Duke ECE rules [C], [S]);
 * - electrolytics: observe polarity and voltage rating, reversed they can vent ([M], maker
 *   application guides).
 */
import type { Caution } from './types.ts';

export const CAUTIONS: readonly Caution[] = [
  { text: 'Low voltage only: build circuits that run from batteries or a low-voltage supply (at most 50 V AC or 120 V DC). Never connect mains to a strip or pad board — the gaps between copper are far too narrow.' },
  { text: 'Solder fume: work with ventilation or fume extraction, keep your face out of the rising smoke, and do not run the iron hotter than needed.' },
  { text: 'Lead: if your solder contains lead, wash your hands after work and keep food and drink away from the bench.' },
  { text: 'Eyes and heat: wear eye protection when soldering and when clipping leads; the tip runs near 400 °C — keep the iron in its stand and work on a non-flammable surface.' },
  { text: 'Electrolytic capacitors: fit them the right way round and within their voltage rating; reversed they can vent.' },
  { text: 'This guide is a planning aid: where local codes, product standards or licensed practice apply, they come first.' },
];
