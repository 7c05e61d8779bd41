/**
 * Route: track cuts, links and copper-side wiring for a placement.
 *
 * `routeLayout(design, placement, options?) → Result<{ layout, stats }>`
 * - `design`: from prepareDesign (parts bound to footprints, pin → net maps).
 * - `placement`: a layout document whose parts are all placed; its cuts, links and wires
 *   are ignored and recomputed.
 * - `options.cutStyle`: 'hole' (drilled at a free hole), 'between' (scored between two
 *   holes) or 'either'; default: the board's `cutStyle`, else 'either'.
 *   `options.linksOverBodies`: links may pass over part bodies; default false.
 *   `options.insulatedLinks`: a net nothing else joins gets an insulated wire link between
 *   two of its islands (bent, or straight over a pin), each reported as a `route.insulated-link`
 *   warning; default false.
 * - `stats`: { cuts, links, linkLengthMm, wires, wireLengthMm } (lengths: pitch × holes).
 *
 * Along each conductor, neighbouring leads of different nets get exactly one cut between
 * them, which is the minimum; an unconnected pin counts as a net of its own. Each cut goes
 * where the links left room in its gap. The islands of each net are then joined: lone-hole
 * islands (pads, copperless holes) by copper-side wires found by maze search, strip islands
 * by a minimum spanning tree of straight links (islands − 1 links of least length whenever
 * landing holes exist), and what is left by a maze search mixing links, wires, solder
 * bridges and free strips as relays; wires and links that stand in a net's way are ripped
 * up and routed again. Only a net that cannot be joined so may take a stretch of another
 * gap or strip end as a stepping stone, one more cut each (see route.ts). Links land only in
 * free holes outside part bodies, never cross each other or a lead, and pass over bodies
 * only when allowed.
 *
 * Failures are results: `route.unroutable` names the net, its islands and why (a drilled cut
 * between neighbouring leads, an island with no free hole, every way blocked); a placement
 * the router cannot read fails with `route.bad-options`, `route.bad-board`,
 * `route.missing-part`, `route.extra-part`, `route.duplicate-part`, `route.missing-pin`,
 * `route.unknown-pin`, `route.duplicate-pin`, `route.off-board`, `route.shared-hole`,
 * `route.footprint` or `route.geometry`. Never a partial layout. Same input, same output.
 *
 * `segmentLengthMm(segment, pitchMm) → number`: length of one link or wire in mm.
 */
export { routeLayout, segmentLengthMm } from './route.ts';
export type { RouteStats, Routed } from './route.ts';
