/**
 * Keyboard shortcuts: one table drives both the key handler and the help panel, so the
 * help can never fall out of step with the keys.
 *
 * `shortcutFor(key, inText)` → the Action a keydown means, or undefined. `key` is the
 * event's { key, ctrlKey, metaKey, shiftKey, altKey }; `inText` is true while a text box
 * has focus, where only the file shortcuts work (the box keeps its own undo and letters).
 */
export type Action =
  | 'undo'
  | 'redo'
  | 'turn'
  | 'lock'
  | 'nudge-left'
  | 'nudge-right'
  | 'nudge-up'
  | 'nudge-down'
  | 'flip-side'
  | 'fit'
  | 'zoom-in'
  | 'zoom-out'
  | 'deselect'
  | 'help'
  | 'auto-place'
  | 'save'
  | 'open';

export interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

export interface Shortcut {
  action: Action;
  /** How the help panel writes the keys. */
  keys: string[];
  what: string;
  /** Also works while typing in a text box. */
  inText?: boolean;
  test(k: KeyLike, mod: boolean): boolean;
}

const plain = (k: KeyLike, mod: boolean) => !mod && !k.altKey;

export const SHORTCUTS: Shortcut[] = [
  { action: 'undo', keys: ['Ctrl+Z'], what: 'Undo the last edit', test: (k, mod) => mod && !k.shiftKey && k.key.toLowerCase() === 'z' },
  { action: 'redo', keys: ['Ctrl+Shift+Z', 'Ctrl+Y'], what: 'Redo the edit just undone', test: (k, mod) => mod && ((k.shiftKey && k.key.toLowerCase() === 'z') || k.key.toLowerCase() === 'y') },
  { action: 'turn', keys: ['R'], what: 'Turn the chosen part a quarter turn', test: (k, mod) => plain(k, mod) && k.key.toLowerCase() === 'r' },
  { action: 'lock', keys: ['L'], what: 'Lock or free the chosen part (a locked part stays put: auto-place and drags leave it alone)', test: (k, mod) => plain(k, mod) && k.key.toLowerCase() === 'l' },
  { action: 'nudge-left', keys: ['←'], what: 'Move the chosen part one hole left', test: (k, mod) => plain(k, mod) && k.key === 'ArrowLeft' },
  { action: 'nudge-right', keys: ['→'], what: 'Move the chosen part one hole right', test: (k, mod) => plain(k, mod) && k.key === 'ArrowRight' },
  { action: 'nudge-up', keys: ['↑'], what: 'Move the chosen part one hole up', test: (k, mod) => plain(k, mod) && k.key === 'ArrowUp' },
  { action: 'nudge-down', keys: ['↓'], what: 'Move the chosen part one hole down', test: (k, mod) => plain(k, mod) && k.key === 'ArrowDown' },
  { action: 'flip-side', keys: ['F'], what: 'Turn the board over (component side / copper side)', test: (k, mod) => plain(k, mod) && k.key.toLowerCase() === 'f' },
  { action: 'fit', keys: ['0'], what: 'Fit the whole board in view', test: (k, mod) => plain(k, mod) && k.key === '0' },
  { action: 'zoom-in', keys: ['+'], what: 'Zoom in', test: (k, mod) => plain(k, mod) && (k.key === '+' || k.key === '=') },
  { action: 'zoom-out', keys: ['-'], what: 'Zoom out', test: (k, mod) => plain(k, mod) && k.key === '-' },
  { action: 'deselect', keys: ['Esc'], what: 'Let go of the chosen part, close a panel', test: (k) => k.key === 'Escape' },
  { action: 'help', keys: ['?'], what: 'Show or hide this list', test: (k) => k.key === '?' },
  { action: 'auto-place', keys: ['Ctrl+Enter'], what: 'Auto-place the whole circuit', inText: true, test: (k, mod) => mod && k.key === 'Enter' },
  { action: 'save', keys: ['Ctrl+S'], what: 'Save the project to a file', inText: true, test: (k, mod) => mod && !k.shiftKey && k.key.toLowerCase() === 's' },
  { action: 'open', keys: ['Ctrl+O'], what: 'Open a project, circuit or netlist file', inText: true, test: (k, mod) => mod && k.key.toLowerCase() === 'o' },
];

export function shortcutFor(k: KeyLike, inText: boolean): Action | undefined {
  const mod = k.ctrlKey || k.metaKey;
  for (const s of SHORTCUTS) if ((!inText || s.inText) && s.test(k, mod)) return s.action;
  return undefined;
}
