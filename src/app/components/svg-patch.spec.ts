import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createSVGWindow } from 'svgdom';
import { SVG, registerWindow, type Dom } from '@svgdotjs/svg.js';
import type { SvgNode } from '../../lib/render/index.ts';
import { adoptDrawing, patchDrawing, sameNode } from './svg-patch.ts';

beforeAll(() => {
  const window = createSVGWindow();
  registerWindow(window, window.document);
});

/** The same element-by-element drawing drawSvg does, for a fresh reference picture. */
function fresh(node: SvgNode): Element {
  const root = SVG();
  const draw = (parent: Dom, n: SvgNode): Dom => {
    const d = parent.element(n.tag) as unknown as Dom;
    d.attr(n.attrs);
    if (n.text !== undefined) d.words(n.text);
    for (const c of n.children ?? []) draw(d, c);
    return d;
  };
  return draw(root, node).node;
}

/** Markup with attributes in name order (attribute order carries no meaning). */
function markup(el: Element): string {
  const attrs = [...el.attributes].map((a) => `${a.name}="${a.value}"`).sort().join(' ');
  const inner = [...el.childNodes].map((c) => (c.nodeType === 1 ? markup(c as Element) : JSON.stringify(c.textContent))).join('');
  return `<${el.tagName} ${attrs}>${inner}</${el.tagName}>`;
}

// Small random painted trees: keyed and unkeyed children, texts that look like markup.
const leaf: fc.Arbitrary<SvgNode> = fc.record({
  tag: fc.constantFrom('circle', 'rect', 'text', 'title'),
  attrs: fc.record({ cx: fc.integer({ min: 0, max: 3 }), fill: fc.constantFrom('#111', '#eee') }, { requiredKeys: [] }).chain((a) =>
    fc.option(fc.integer({ min: 0, max: 4 }), { nil: undefined }).map((id) => (id === undefined ? { ...a } : { ...a, 'data-id': `k${id}` })),
  ),
  text: fc.option(fc.constantFrom('R1', '<b>x</b>', '10k & up'), { nil: undefined }),
}).map((n) => (n.text === undefined ? { tag: n.tag, attrs: n.attrs } : n)) as fc.Arbitrary<SvgNode>;
const group = (kids: fc.Arbitrary<SvgNode>): fc.Arbitrary<SvgNode> =>
  fc.record({ cls: fc.constantFrom('a', 'b'), children: fc.array(kids, { maxLength: 6 }) }).map(({ cls, children }) => ({ tag: 'g', attrs: { class: cls }, children }));
const tree = group(fc.oneof(leaf, group(leaf)));

describe('patching a drawn board', () => {
  it('ends with exactly the picture a fresh drawing makes (property)', () => {
    fc.assert(
      fc.property(tree, tree, tree, (a, b, c) => {
        let drawn = adoptDrawing(fresh(a), a);
        const el = drawn.el;
        drawn = patchDrawing(drawn, b);
        expect(markup(drawn.el)).toBe(markup(fresh(b)));
        drawn = patchDrawing(drawn, c);
        expect(drawn.el).toBe(el); // patched in place, never replaced
        expect(markup(drawn.el)).toBe(markup(fresh(c)));
      }),
      { numRuns: 150 },
    );
  });

  it('leaves unchanged elements alone and keeps keyed ones when they move', () => {
    const a: SvgNode = { tag: 'g', attrs: {}, children: [{ tag: 'circle', attrs: { 'data-id': 'p1', cx: 1 } }, { tag: 'circle', attrs: { 'data-id': 'p2', cx: 2 } }] };
    const b: SvgNode = { tag: 'g', attrs: {}, children: [{ tag: 'circle', attrs: { 'data-id': 'p2', cx: 2 } }, { tag: 'circle', attrs: { 'data-id': 'p1', cx: 5 } }] };
    const drawn = adoptDrawing(fresh(a), a);
    const [e1, e2] = [drawn.kids[0]!.el, drawn.kids[1]!.el];
    const after = patchDrawing(drawn, b);
    expect(after.kids[0]!.el).toBe(e2);
    expect(after.kids[1]!.el).toBe(e1);
    expect(e1.getAttribute('cx')).toBe('5');
  });

  it('keeps markup-looking text as text', () => {
    const a: SvgNode = { tag: 'g', attrs: {}, children: [{ tag: 'text', attrs: {}, text: 'R1' }] };
    const b: SvgNode = { tag: 'g', attrs: {}, children: [{ tag: 'text', attrs: {}, text: '<script>alert(1)</script>' }] };
    const drawn = patchDrawing(adoptDrawing(fresh(a), a), b);
    expect(drawn.el.querySelector('script')).toBeNull();
    expect(drawn.kids[0]!.el.textContent).toBe('<script>alert(1)</script>');
    expect(sameNode(a, b)).toBe(false);
  });
});
