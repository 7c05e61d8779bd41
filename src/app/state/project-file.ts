/**
 * Project files and autosave. A project holds the circuit text exactly as typed (even when
 * it does not parse yet), the last circuit that did parse, the layout and the plan options.
 *
 * - `toProject(doc, view?, now?)` → Project ready to save (validated by ProjectSchema).
 * - `readProject(text)` → Result<Project>: JSON syntax, migrations (migrateProject), schema.
 * - `saveDraft(store, project)` / `loadDraft(store)`: the autosave slot in a Storage-like
 *   store (localStorage in the page, a Map in tests). Saving never throws: a full store
 *   comes back as a problem. A draft that no longer validates is set aside under
 *   DRAFT_KEY + '.unreadable' rather than deleted, so nothing typed is ever lost.
 */
import {
  ProjectSchema,
  fail,
  migrateProject,
  ok,
  parseJsonText,
  validate,
  type Circuit,
  type Layout,
  type PlanOptions,
  type Project,
  type Result,
  type Source,
} from '../../lib/model/index.ts';

/** What the edit history holds: everything the user can change and undo. */
export interface Doc {
  source: Source;
  circuit: Circuit;
  layout?: Layout;
  options: PlanOptions;
}

export const DRAFT_KEY = 'kerfline.draft.v1';

export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export function toProject(doc: Doc, view?: Record<string, unknown>, now: Date = new Date()): Project {
  const p: Project = { format: 'kerfline.project', version: 1, source: doc.source, circuit: doc.circuit, options: doc.options, savedAt: now.toISOString() };
  if (doc.layout) p.layout = doc.layout;
  if (view) p.view = view;
  return p;
}

export function fromProject(p: Project): Doc {
  const doc: Doc = { source: p.source, circuit: p.circuit, options: p.options };
  if (p.layout) doc.layout = p.layout;
  return doc;
}

export function readProject(text: string): Result<Project> {
  const json = parseJsonText(text, 'project');
  if (!json.ok) return fail(json.problems);
  return validate(ProjectSchema, migrateProject(json.value), 'project', text);
}

export function saveDraft(store: KeyValueStore, project: Project): Result<number> {
  const text = JSON.stringify(project);
  try {
    store.setItem(DRAFT_KEY, text);
    return ok(text.length);
  } catch (e) {
    return fail([
      {
        code: 'app.autosave-failed',
        severity: 'warning',
        path: [],
        message: `the browser refused to keep the draft (${e instanceof Error ? e.name : 'storage error'}, ${Math.round(text.length / 1024)} kB)`,
        hint: 'save the project to a file now; then clear other saved data for this page',
      },
    ]);
  }
}

/** The saved draft, `undefined` when there is none, or the problems that keep it from loading. */
export function loadDraft(store: KeyValueStore): Result<Project> | undefined {
  let text: string | null;
  try {
    text = store.getItem(DRAFT_KEY);
  } catch {
    return undefined;
  }
  if (text === null) return undefined;
  const r = readProject(text);
  if (!r.ok) {
    try {
      store.setItem(`${DRAFT_KEY}.unreadable`, text);
    } catch {
      /* keeping the copy is best effort; the problems still reach the user */
    }
  }
  return r;
}

/** A file name from a title: letters, digits and dashes only. */
export function fileStem(title: string): string {
  const stem = title
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40);
  return stem || 'kerfline';
}
