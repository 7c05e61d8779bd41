import { describe, expect, it } from 'vitest';
import { CircuitSchema, PlanOptionsSchema, ProjectSchema } from '../../lib/model/index.ts';
import { DRAFT_KEY, fileStem, fromProject, loadDraft, readProject, saveDraft, toProject, type Doc, type KeyValueStore } from './project-file.ts';
import { smallLayout } from './fixtures.ts';

function memoryStore(limit = Infinity): KeyValueStore & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return {
    map,
    getItem: (k) => map.get(k) ?? null,
    setItem: (k, v) => {
      if (v.length > limit) throw Object.assign(new Error('full'), { name: 'QuotaExceededError' });
      map.set(k, v);
    },
    removeItem: (k) => void map.delete(k),
  };
}

const doc = (): Doc => ({
  source: { kind: 'json', text: '{ "half typed', name: 'x.json' },
  circuit: CircuitSchema.parse({ format: 'kerfline.circuit', version: 1, title: 'T', parts: [] }),
  layout: smallLayout(),
  options: PlanOptionsSchema.parse({ seed: 7 }),
});

describe('project files and drafts', () => {
  it('round-trips a document through a project file, keeping half-typed text', () => {
    const p = toProject(doc(), { side: 'copper' }, new Date(0));
    expect(ProjectSchema.safeParse(p).success).toBe(true);
    const back = readProject(JSON.stringify(p));
    expect(back.ok).toBe(true);
    if (!back.ok) return;
    expect(fromProject(back.value)).toEqual(doc());
    expect(back.value.view).toEqual({ side: 'copper' });
  });

  it('reports a broken project file with a line number, without throwing', () => {
    const r = readProject('{\n  "format": "kerfline.project",\n  "version": 1,\n  oops\n}');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.line).toBe(4);
    const wrong = readProject(JSON.stringify({ format: 'kerfline.project', version: 1 }));
    expect(!wrong.ok && wrong.problems.some((p) => p.path[0] === 'source')).toBe(true);
  });

  it('saves and loads the draft slot', () => {
    const store = memoryStore();
    expect(loadDraft(store)).toBeUndefined();
    expect(saveDraft(store, toProject(doc())).ok).toBe(true);
    const r = loadDraft(store);
    expect(r?.ok && r.value.source.text).toBe('{ "half typed');
  });

  it('turns a full store into a warning instead of an exception', () => {
    const r = saveDraft(memoryStore(10), toProject(doc()));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.code).toBe('app.autosave-failed');
  });

  it('sets an unreadable draft aside instead of losing it', () => {
    const store = memoryStore();
    store.setItem(DRAFT_KEY, '{"format":"kerfline.project"');
    const r = loadDraft(store);
    expect(r?.ok).toBe(false);
    expect(store.map.get(`${DRAFT_KEY}.unreadable`)).toBe('{"format":"kerfline.project"');
  });

  it('makes safe file names from any title', () => {
    expect(fileStem('Twin LFO <b>v2</b>')).toBe('twin-lfo-b-v2-b');
    expect(fileStem('<<>>')).toBe('kerfline');
  });
});
