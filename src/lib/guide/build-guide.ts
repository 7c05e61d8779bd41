/**
 * `buildGuide(circuit, layout): Result<Guide>`
 *
 * Everything a builder needs, as data: board preparation (kind, size, trim rectangle), the
 * cut list in copper-side coordinates grouped by row, links and copper-side wires with
 * lengths and the wire to use (22 AWG solid on 1 mm holes), the parts list grouped by value
 * (IEC 60062 value, colour bands, capacitor code, polarity, footprint, lead spacing), the
 * build order by height class, off-board wiring, the probe checklist and the cautions, plus
 * both drawings as Scenes. The layout is verified first: a layout that does not match the
 * circuit gives no guide (fails with `guide.layout-faults` and the verifier's faults), as
 * does a circuit that does not prepare. Pure and deterministic.
 */
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import { fail, ok, type Result } from '../model/problem.ts';
import { prepareDesign } from '../netlist/design.ts';
import { drawScene } from '../render/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { linkWire } from './awg.ts';
import { boardPrep } from './board-prep.ts';
import { buildOrder } from './build-order.ts';
import { CAUTIONS } from './cautions.ts';
import { cutList } from './cut-list.ts';
import { designForLayout } from './layout-design.ts';
import { offBoardList } from './off-board.ts';
import { partsList } from './parts-list.ts';
import { placedParts } from './placed.ts';
import { probeList } from './probes.ts';
import { linkList, wireList } from './segments.ts';
import type { Guide } from './types.ts';

export function buildGuide(circuit: Circuit, layout: Layout): Result<Guide> {
  const prepared = prepareDesign(circuit);
  if (!prepared.ok) return fail(prepared.problems, prepared.warnings);
  const report = verifyLayout(circuit, layout);
  if (!report.clean)
    return fail(
      [
        {
          code: 'guide.layout-faults',
          severity: 'error',
          path: [],
          message: `the layout does not match the circuit "${circuit.title}" (${report.faults.length} fault${report.faults.length === 1 ? '' : 's'}); no bench guide is made for it`,
          hint: 'fix the faults listed (kerfline verify shows them), then make the guide again',
        },
        ...report.faults,
      ],
      [...prepared.warnings, ...report.warnings],
    );
  const design = designForLayout(prepared.value, circuit, layout);
  const placed = placedParts(layout, design);
  const copper = drawScene(layout, design, { side: 'copper' });
  const component = drawScene(layout, design, { side: 'component' });
  const links = linkList(layout, component);
  const wires = wireList(layout, component);
  const warnings = [...prepared.warnings, ...report.warnings];
  const guide: Guide = {
    title: circuit.title,
    board: boardPrep(layout, placed),
    cuts: cutList(copper),
    cutCount: layout.cuts.length,
    links,
    wires,
    wireStock: linkWire(),
    parts: partsList(placed, layout.board.pitchMm),
    buildOrder: buildOrder(placed, links, wires),
    offBoard: offBoardList(placed, layout.board.cols),
    probes: probeList(circuit, layout),
    cautions: [...CAUTIONS],
    scenes: { copper, component },
    warnings,
  };
  return ok(guide, warnings);
}
