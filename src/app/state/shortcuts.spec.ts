import { describe, expect, it } from 'vitest';
import { SHORTCUTS, shortcutFor, type KeyLike } from './shortcuts.ts';

const key = (k: string, mods: Partial<KeyLike> = {}): KeyLike => ({ key: k, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

describe('keyboard shortcuts', () => {
  it('maps the undo and redo chords', () => {
    expect(shortcutFor(key('z', { ctrlKey: true }), false)).toBe('undo');
    expect(shortcutFor(key('Z', { ctrlKey: true, shiftKey: true }), false)).toBe('redo');
    expect(shortcutFor(key('y', { ctrlKey: true }), false)).toBe('redo');
    expect(shortcutFor(key('z', { metaKey: true }), false)).toBe('undo');
  });

  it('maps single letters only without modifiers', () => {
    expect(shortcutFor(key('r'), false)).toBe('turn');
    expect(shortcutFor(key('R', { shiftKey: true }), false)).toBe('turn');
    expect(shortcutFor(key('r', { ctrlKey: true }), false)).toBeUndefined();
    expect(shortcutFor(key('l'), false)).toBe('lock');
  });

  it('leaves typing alone in text boxes except the file chords', () => {
    expect(shortcutFor(key('r'), true)).toBeUndefined();
    expect(shortcutFor(key('z', { ctrlKey: true }), true)).toBeUndefined();
    expect(shortcutFor(key('s', { ctrlKey: true }), true)).toBe('save');
  });

  it('lists every action once with keys and words for the help panel', () => {
    const actions = SHORTCUTS.map((s) => s.action);
    expect(new Set(actions).size).toBe(actions.length);
    for (const s of SHORTCUTS) {
      expect(s.keys.length).toBeGreaterThan(0);
      expect(s.what.length).toBeGreaterThan(5);
    }
  });
});
