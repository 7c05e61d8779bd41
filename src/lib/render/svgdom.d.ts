// svgdom ships no types; this is the little of it src/cli/svg-node.ts uses.
declare module 'svgdom' {
  export function createSVGWindow(): Window & typeof globalThis;
}
