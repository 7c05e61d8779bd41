/**
 * `offSeriesWarning(value, quantity) → Problem | undefined`
 *
 * A note (code `value.off-series`, severity 'note') when a value is in no series a builder
 * can buy from stock: resistors in neither E24 nor E96 (4k8 → nearest E24 4k7, E96 4k75),
 * capacitors and inductors not in E24. Undefined for stock values, zero (a 0R link),
 * voltages and anything not finite and positive. `data.nearest` holds the suggestions.
 */
import type { Problem } from '../model/problem.ts';
import { formatValue } from './format.ts';
import type { Quantity } from './quantity.ts';
import { isPreferred, nearestPreferred, type SeriesName } from './series.ts';

const STOCK: Readonly<Record<Quantity, readonly SeriesName[]>> = {
  resistance: ['E24', 'E96'],
  capacitance: ['E24'],
  inductance: ['E24'],
  voltage: [],
};

export function offSeriesWarning(value: number, quantity: Quantity): Problem | undefined {
  const series = STOCK[quantity];
  if (series.length === 0 || !Number.isFinite(value) || value <= 0) return undefined;
  if (series.some((s) => isPreferred(value, s))) return undefined;
  const nearest: Record<string, number> = {};
  for (const s of series) {
    const n = nearestPreferred(value, s);
    if (n !== undefined) nearest[s] = n;
  }
  const text = formatValue(value, quantity);
  const list = Object.entries(nearest).map(([s, n]) => `${s} ${formatValue(n, quantity)}`);
  return {
    code: 'value.off-series',
    severity: 'note',
    path: [],
    message: `${text} is in no stock series (${series.join(', ')}): nearest ${list.join(', ')}`,
    hint: `use ${list.join(' or ')} unless the odd value is meant`,
    data: { value, nearest },
  };
}
