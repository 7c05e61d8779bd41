/**
 * The working screen's state: one document under an edit history, and everything computed
 * from it. Components read fields and call methods; the rules live in the plain modules
 * this one ties together (edits, checker, reading, project-file, plan-client).
 *
 * `Workspace.open(store)` restores the autosaved draft from `store` (localStorage) or opens
 * the bundled demo. Every change goes through `commit`, which records it in the history,
 * brings the checks up to date and writes the autosave at once (a crash loses nothing).
 * Part edits re-route and re-verify before they are recorded, so undo restores a routed,
 * checked layout without routing again.
 */
import { prepareDesign } from '../../lib/netlist/design.ts';
import { LayoutSchema, PlanOptionsSchema, parseDocument, type Circuit, type Hole, type Layout, type PlanOptions, type Problem, type Source } from '../../lib/model/index.ts';
import type { Offset } from '../../lib/parts/index.ts';
import { canRedo, canUndo, record, redo, redoLabel, startHistory, undo, undoLabel, type History } from './history.ts';
import { movePart, toggleLock, turnPart, type EditResult } from './edits.ts';
import { Checker, type Checked } from './checker.ts';
import { readSource, sniffFile, type Reading } from './reading.ts';
import { fileStem, fromProject, loadDraft, readProject, saveDraft, toProject, type Doc, type KeyValueStore } from './project-file.ts';
import { bundledDemo, demoDoc } from './demo.ts';
import { problemHoles } from './locate.ts';
import { designAsLaid } from './design-as-laid.ts';
import { insulatedNotes } from '../../lib/render/index.ts';
import { startPlan, type PlanRun } from '../worker/plan-client.ts';
import type { Result } from '../../lib/model/index.ts';

export type Side = 'component' | 'copper';

export interface PlanView {
  running: boolean;
  phase: string;
  fraction: number;
  /** Best and current cost at each progress report, for the little plot. */
  points: { fraction: number; best: number; cost: number }[];
  outcome?: 'done' | 'failed' | 'cancelled' | 'crashed';
  problems: Problem[];
}

export interface Located {
  holes: Hole[];
  /** Grows on every request, so asking for the same place twice flashes twice. */
  token: number;
  what: string;
}

const readings = new WeakMap<Source, Result<Reading>>();
function readCached(source: Source): Result<Reading> {
  let r = readings.get(source);
  if (!r) readings.set(source, (r = readSource(source)));
  return r;
}

export class Workspace {
  history = $state.raw<History<Doc>>(undefined as unknown as History<Doc>);
  checked = $state.raw<Checked | undefined>(undefined);
  side = $state<Side>('component');
  selected = $state<string | undefined>(undefined);
  hoverNet = $state<string | undefined>(undefined);
  located = $state.raw<Located | undefined>(undefined);
  plan = $state.raw<PlanView | undefined>(undefined);
  status = $state('');
  /** Route + verify time of the last part edit, ms. */
  lastEditMs = $state<number | undefined>(undefined);
  /** Problems from opening a file or the demo, shown above the checks. */
  openProblems = $state.raw<Problem[]>([]);
  /** How the session began: 'draft' (autosave), 'demo-layout' (committed layout) or 'demo-planned'. */
  openedFrom = $state<'draft' | 'demo-layout' | 'demo-planned'>('demo-layout');
  /** Warnings the last auto-place left (lead orders to check and the like). */
  planWarnings = $state.raw<Problem[]>([]);

  doc = $derived(this.history.present.value);
  source = $derived(this.doc.source);
  circuit = $derived(this.doc.circuit);
  layout = $derived(this.doc.layout);
  options = $derived(this.doc.options);
  reading = $derived(readCached(this.source));
  designResult = $derived(prepareDesign(this.circuit));
  packing = $derived(this.layout?.packing);
  spares = $derived(this.layout?.spares);
  /** The design as the layout packs it (auto-place may have swapped op-amp sections). */
  design = $derived(this.designResult.ok ? designAsLaid(this.designResult.value, this.circuit, this.packing, this.spares) : undefined);
  checker = $derived(new Checker(this.circuit, this.design));
  pinOrders = $derived(new Map((this.design?.parts ?? []).map((p) => [p.ref, p.pinNames] as const)));
  canUndo = $derived(canUndo(this.history));
  canRedo = $derived(canRedo(this.history));
  undoLabel = $derived(undoLabel(this.history));
  redoLabel = $derived(redoLabel(this.history));
  /** Faults: what is wrong with the board as it would be built. */
  faults = $derived.by((): Problem[] => {
    const out: Problem[] = [];
    if (!this.designResult.ok) out.push(...this.designResult.problems);
    if (this.checked) out.push(...this.checked.routeProblems, ...this.checked.report.faults);
    return out;
  });
  /** Warnings and notes: worth reading, nothing to fix before building. */
  notes = $derived.by((): Problem[] => {
    const seen = new Set<string>();
    const out: Problem[] = [];
    // Insulated links are read off the board as it is now (a plan's own warnings go stale at the first edit).
    const plan = this.planWarnings.filter((w) => w.code !== 'route.insulated-link');
    const sleeved = this.checked ? insulatedNotes(this.checked.layout) : [];
    for (const p of [...this.designResult.warnings, ...plan, ...sleeved, ...(this.checked?.report.warnings ?? [])]) {
      const key = `${p.code}\u0000${p.message}`;
      if (seen.has(key)) continue;
      seen.add(key);
      out.push(p);
    }
    return out;
  });

  private run: PlanRun | undefined;
  private locateCount = 0;

  private constructor(
    doc: Doc,
    private readonly store: KeyValueStore | undefined,
  ) {
    this.history = startHistory(doc);
    if (doc.layout) this.checked = this.checker.check(doc.layout);
  }

  static open(store: KeyValueStore | undefined): Workspace {
    const draft = store ? loadDraft(store) : undefined;
    if (draft?.ok) {
      const ws = new Workspace(fromProject(draft.value), store);
      ws.openedFrom = 'draft';
      const side = draft.value.view?.side;
      if (side === 'component' || side === 'copper') ws.side = side;
      ws.status = `Restored your work from ${draft.value.savedAt ? new Date(draft.value.savedAt).toLocaleString() : 'the last visit'}.`;
      // A draft saved before its first layout was made (a reload mid-plan) is planned again.
      if (!draft.value.layout && ws.designResult.ok) ws.autoPlace();
      return ws;
    }
    const demo = bundledDemo();
    const opened = demoDoc(demo);
    if (!opened.doc) throw new Error(`the bundled demo ${demo.name} does not read: ${opened.problems[0]?.message ?? ''}`);
    const ws = new Workspace(opened.doc, store);
    ws.openProblems = [...(draft && !draft.ok ? draft.problems : []), ...opened.problems];
    if (draft && !draft.ok) ws.status = 'The saved draft could not be read; it was set aside and the demo opened instead.';
    if (!opened.doc.layout) {
      // No committed layout to show: plan quickly for the first paint (Auto-place redoes it
      // with the chosen effort).
      ws.openedFrom = 'demo-planned';
      ws.autoPlace({ effort: 'quick' });
    }
    return ws;
  }

  // --- recording ------------------------------------------------------------------------

  private commit(doc: Doc, label: string, opts: { mergeKey?: string; checked?: Checked } = {}): void {
    this.history = record(this.history, doc, label, opts.mergeKey);
    this.recheck(opts.checked);
    this.saveNow();
  }

  private recheck(checked?: Checked): void {
    const layout = this.layout;
    this.checked = checked ?? (layout ? this.checker.check(layout) : undefined);
    if (this.selected && !layout?.parts.some((p) => p.ref === this.selected)) this.selected = undefined;
  }

  undo(): void {
    if (!canUndo(this.history)) return;
    const label = undoLabel(this.history);
    this.history = undo(this.history);
    this.recheck();
    this.saveNow();
    this.status = `Undid: ${label}.`;
  }

  redo(): void {
    if (!canRedo(this.history)) return;
    const label = redoLabel(this.history);
    this.history = redo(this.history);
    this.recheck();
    this.saveNow();
    this.status = `Redid: ${label}.`;
  }

  // --- autosave -------------------------------------------------------------------------

  /** Write the draft now: after every change, and on page hide for the view state. */
  saveNow(): void {
    if (!this.store) return;
    const r = saveDraft(this.store, toProject(this.doc, { side: this.side }));
    if (!r.ok) this.status = r.problems[0]!.message;
  }

  // --- circuit text ---------------------------------------------------------------------

  setSourceText(text: string): void {
    this.setSource({ ...this.source, text }, 'edit the circuit text', 'source-text');
  }

  setSourceKind(kind: Source['kind']): void {
    if (kind !== this.source.kind) this.setSource({ ...this.source, kind }, `read the text as ${kind === 'json' ? 'JSON' : 'SPICE'}`);
  }

  private setSource(source: Source, label: string, mergeKey?: string): Reading | undefined {
    const r = readCached(source);
    let circuit: Circuit = this.circuit;
    // A new circuit only when it really differs: the checker (and its incremental state) stays.
    if (r.ok && JSON.stringify(r.value.circuit) !== JSON.stringify(this.circuit)) circuit = r.value.circuit;
    const doc: Doc = { ...this.doc, source, circuit };
    this.commit(doc, label, mergeKey === undefined ? {} : { mergeKey });
    return r.ok ? r.value : undefined;
  }

  // --- options --------------------------------------------------------------------------

  setOptions(patch: Partial<PlanOptions>): void {
    const next = PlanOptionsSchema.safeParse({ ...this.options, ...patch });
    if (!next.success) {
      this.status = `That board setting is out of range: ${next.error.issues[0]?.message ?? ''}`;
      return;
    }
    this.commit({ ...this.doc, options: next.data }, 'change the board settings', { mergeKey: 'options' });
  }

  // --- part edits -----------------------------------------------------------------------

  private editPart(label: string, ref: string, edit: (layout: Layout) => EditResult, reroute = true, mergeKey?: string): boolean {
    const layout = this.layout;
    if (!layout) return false;
    const r = edit(layout);
    if (!r.ok) {
      this.status = r.why;
      return false;
    }
    // The live re-route may use insulated wire links when the plan may (each one is flagged).
    const opts = { cutStyle: this.options.cutStyle, linksOverBodies: this.options.linksOverBodies, insulatedLinks: this.options.insulatedLinks };
    const checked = reroute ? this.checker.afterEdit(r.layout, [ref], this.checked?.layout ?? layout, opts) : this.checker.check(r.layout);
    if (reroute) this.lastEditMs = checked.timing.totalMs;
    this.commit({ ...this.doc, layout: checked.layout }, label, mergeKey === undefined ? { checked } : { checked, mergeKey });
    const n = this.faults.length;
    this.status = `${label[0]!.toUpperCase()}${label.slice(1)}: ${n === 0 ? 'the board checks clean' : `${n} finding${n === 1 ? '' : 's'} in the checks list`}.`;
    return true;
  }

  /** Locked parts stay put for auto-place and for stray drags alike. */
  private refuseLocked(ref: string): boolean {
    if (this.layout?.parts.find((p) => p.ref === ref)?.locked !== true) return false;
    this.status = `${ref} is locked; free it (L) to move or turn it.`;
    return true;
  }

  move(ref: string, delta: Offset, mergeKey?: string): boolean {
    if ((delta[0] === 0 && delta[1] === 0) || this.refuseLocked(ref)) return false;
    return this.editPart(`move ${ref}`, ref, (l) => movePart(l, ref, delta), true, mergeKey);
  }

  turn(ref: string): boolean {
    if (this.refuseLocked(ref)) return false;
    return this.editPart(`turn ${ref}`, ref, (l) => turnPart(l, ref, this.pinOrders.get(ref)));
  }

  toggleLock(ref: string): boolean {
    const was = this.layout?.parts.find((p) => p.ref === ref)?.locked === true;
    return this.editPart(`${was ? 'free' : 'lock'} ${ref}`, ref, (l) => toggleLock(l, ref), false);
  }

  // --- view state -----------------------------------------------------------------------

  flipSide(): void {
    this.side = this.side === 'component' ? 'copper' : 'component';
    this.saveNow();
  }

  locate(p: Problem): void {
    const holes = problemHoles(p, this.layout, this.design);
    if (!holes.length) {
      this.status = 'That finding is about the whole circuit, not a place on the board.';
      return;
    }
    this.located = { holes, token: ++this.locateCount, what: p.message };
    if (p.refs?.length === 1 && this.layout?.parts.some((q) => q.ref === p.refs![0])) this.selected = p.refs[0];
  }

  // --- auto-place -----------------------------------------------------------------------

  /** Plan the whole circuit in the worker; `overrides` change this run's options only. */
  autoPlace(overrides: Partial<PlanOptions> = {}): void {
    if (this.run) return;
    const circuit = this.circuit;
    const options = { ...this.options, ...overrides };
    const view: PlanView = { running: true, phase: 'starting', fraction: 0, points: [], problems: [] };
    this.plan = view;
    this.status = 'Auto-placing…';
    const request = this.layout ? { circuit, options, start: this.layout } : { circuit, options };
    const finish = (patch: Partial<PlanView>) => {
      this.run = undefined;
      this.plan = { ...(this.plan ?? view), running: false, ...patch };
    };
    this.run = startPlan(request, {
      progress: (p) => {
        const prev = this.plan ?? view;
        this.plan = { ...prev, phase: p.phase, fraction: p.fraction, points: [...prev.points, { fraction: p.fraction, best: p.best, cost: p.cost }] };
      },
      done: (layout, _stats, warnings) => {
        finish({ outcome: 'done', fraction: 1, phase: 'done' });
        if (this.circuit !== circuit) {
          this.status = 'The circuit changed while placing; that result was set aside. Auto-place again.';
          return;
        }
        this.commit({ ...this.doc, layout }, 'auto-place');
        const n = this.faults.length;
        this.status = n === 0 ? `Auto-placed: ${layout.parts.length} parts, the board checks clean.` : `Auto-placed, with ${n} finding${n === 1 ? '' : 's'} to look at.`;
        this.planWarnings = warnings;
      },
      failed: (problems) => {
        finish({ outcome: 'failed', problems });
        const first = problems[0]?.message ?? '';
        this.status = `Auto-place found no layout: ${first.length > 160 ? `${first.slice(0, 160)}…` : first} (details under Checks).`;
      },
      crashed: (message) => {
        finish({ outcome: 'crashed' });
        this.status = `Auto-place stopped on an internal error (${message}). Your layout is unchanged.`;
      },
    });
  }

  cancelPlan(): void {
    if (!this.run) return;
    this.run.cancel();
    this.run = undefined;
    if (this.plan) this.plan = { ...this.plan, running: false, outcome: 'cancelled' };
    this.status = 'Auto-place cancelled; the board is as it was.';
  }

  // --- files ----------------------------------------------------------------------------

  /** Open a dropped or chosen file: project, circuit, layout or SPICE-syntax netlist. */
  openFile(name: string, text: string): void {
    const kind = sniffFile(name, text);
    this.openProblems = [];
    this.planWarnings = [];
    if (kind === 'project') {
      const p = readProject(text);
      if (!p.ok) {
        this.openProblems = p.problems;
        this.status = `${name} is not a project file this version can read.`;
        return;
      }
      this.cancelPlan();
      this.commit(fromProject(p.value), `open ${name}`);
      this.status = `Opened ${name}.`;
      return;
    }
    if (kind === 'layout') {
      const l = parseDocument(LayoutSchema, text, 'layout');
      if (!l.ok) {
        this.openProblems = l.problems;
        this.status = `${name} is not a layout document.`;
        return;
      }
      this.commit({ ...this.doc, layout: l.value }, `open layout ${name}`);
      this.status = `Opened the layout ${name} for this circuit.`;
      return;
    }
    if (kind === 'unknown-json') {
      this.status = `${name} is JSON but not a Kerfline project, circuit or layout (no "format" field).`;
      return;
    }
    const read = this.setSource({ kind: kind === 'spice' ? 'spice' : 'json', text, name }, `open ${name}`);
    if (read) {
      this.status = `Read ${name}: ${read.circuit.parts.length} parts. Placing them…`;
      this.autoPlace();
    } else this.status = `${name} has problems; they are listed under the circuit text.`;
  }

  projectFile(): { name: string; text: string } {
    return { name: `${fileStem(this.circuit.title)}.kerfline.json`, text: JSON.stringify(toProject(this.doc, { side: this.side }), null, 2) };
  }

  layoutFile(): { name: string; text: string } | undefined {
    return this.layout && { name: `${fileStem(this.circuit.title)}.layout.json`, text: JSON.stringify(this.layout, null, 2) };
  }

  startOver(): void {
    this.cancelPlan();
    const opened = demoDoc(bundledDemo());
    if (!opened.doc) return;
    this.planWarnings = [];
    this.commit(opened.doc, 'open the demo');
    if (!opened.doc.layout) this.autoPlace({ effort: 'quick' });
    this.status = 'Opened the demo project (undo brings your work back).';
  }
}
