/**
 * SPICE text → cards (check-values §10, Berkeley SPICE3 rules with ngspice extensions).
 *
 * `readCards(text): { title, titleLine, cards, problems }`
 *
 * Line 1 is the title. Blank lines are skipped; a line whose first non-blank character is
 * `*` is a comment (a comment starting `* kerfline:` is kept as a note card); a line
 * starting with `+` continues the previous card. End-of-line comments `;`, `$ ` and `//`
 * are cut off. `.control` … `.endc` blocks are skipped whole and reading stops at `.end`.
 * Fields split on blanks, commas and parentheses; `key = value` pairs become params;
 * `{…}` and `'…'` expressions stay one token. Every token keeps its line and column.
 */
import type { Problem } from '../model/problem.ts';

export interface Tok {
  text: string;
  line: number;
  column: number;
}

export interface Card {
  kind: 'element' | 'dot' | 'note';
  line: number;
  column: number;
  /** Positional fields (for a note: the whole note text as one token). */
  words: Tok[];
  params: { key: Tok; value: Tok }[];
}

export interface Deck {
  title: string;
  cards: Card[];
  problems: Problem[];
  /** Lines skipped by `.control` blocks or after `.end`, for the report. */
  skipped: { line: number; what: string }[];
}

const NOTE = /^\*\s*kerfline\s*:/i;

/** Cut an end-of-line comment (`;`, `$ `, `//`) outside braces and quotes. */
function stripComment(s: string): string {
  let depth = 0;
  let quote = false;
  for (let i = 0; i < s.length; i++) {
    const c = s[i]!;
    if (c === "'") quote = !quote;
    else if (!quote && c === '{') depth++;
    else if (!quote && c === '}') depth = Math.max(0, depth - 1);
    if (quote || depth > 0) continue;
    if (c === ';') return s.slice(0, i);
    if (c === '/' && s[i + 1] === '/') return s.slice(0, i);
    if (c === '$' && (i === 0 || /\s/.test(s[i - 1]!)) && (i + 1 === s.length || /\s/.test(s[i + 1]!))) return s.slice(0, i);
  }
  return s;
}

/** Split one physical line (from `start`) into raw tokens, `=` kept as its own token. */
function splitLine(s: string, line: number, start: number): Tok[] {
  const out: Tok[] = [];
  let i = start;
  while (i < s.length) {
    const c = s[i]!;
    if (/[\s,()]/.test(c)) {
      i++;
      continue;
    }
    if (c === '=') {
      out.push({ text: '=', line, column: i + 1 });
      i++;
      continue;
    }
    const from = i;
    if (c === '{' || c === "'") {
      const close = c === '{' ? '}' : "'";
      i++;
      while (i < s.length && s[i] !== close) i++;
      i = Math.min(s.length, i + 1);
    } else {
      while (i < s.length && !/[\s,()=]/.test(s[i]!)) i++;
    }
    out.push({ text: s.slice(from, i), line, column: from + 1 });
  }
  return out;
}

/** Raw tokens → positional words and `key = value` params. */
function shape(tokens: Tok[]): Pick<Card, 'words' | 'params'> {
  const words: Tok[] = [];
  const params: Card['params'] = [];
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i]!;
    const next = tokens[i + 1];
    if (next?.text === '=') {
      const value = tokens[i + 2];
      params.push({ key: t, value: value && value.text !== '=' ? value : { text: '', line: next.line, column: next.column + 1 } });
      i += value && value.text !== '=' ? 2 : 1;
      continue;
    }
    if (t.text === '=') continue; // a stray "=" with no key before it
    words.push(t);
  }
  return { words, params };
}

export function readCards(text: string): Deck {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const problems: Problem[] = [];
  const skipped: Deck['skipped'] = [];
  const cards: Card[] = [];
  const title = (lines[0] ?? '').trim();
  let raw: Tok[] | undefined; // tokens of the open card
  let open: Card | undefined;
  const close = () => {
    if (open && raw) Object.assign(open, shape(raw));
    open = undefined;
    raw = undefined;
  };
  let inControl = false;
  let controlLine = 0;
  for (let n = 1; n < lines.length; n++) {
    const lineNo = n + 1;
    const s = lines[n]!;
    const lead = s.search(/\S/);
    if (lead < 0) continue;
    const first = s[lead]!;
    const word = /^\S*/.exec(s.slice(lead))![0].toLowerCase();
    if (inControl) {
      if (word === '.endc') inControl = false;
      continue;
    }
    if (first === '*') {
      if (NOTE.test(s.slice(lead))) {
        // A note never interrupts a card: a "+" line may still follow it.
        const body = s.slice(lead).replace(NOTE, '');
        const off = s.length - body.length;
        cards.push({ kind: 'note', line: lineNo, column: lead + 1, words: [{ text: body.trim(), line: lineNo, column: off + 1 + (body.length - body.trimStart().length) }], params: [] });
      }
      continue;
    }
    const body = stripComment(s);
    if (first === '+') {
      if (!open || !raw) {
        problems.push({
          code: 'spice.orphan-continuation',
          severity: 'error',
          path: [],
          line: lineNo,
          column: lead + 1,
          message: 'a "+" continuation line with no card before it to continue',
          hint: 'join it to the line it belongs to, or remove the "+"',
        });
        continue;
      }
      raw.push(...splitLine(body, lineNo, lead + 1));
      continue;
    }
    close();
    if (body.trim() === '') continue;
    if (word === '.control') {
      inControl = true;
      controlLine = lineNo;
      skipped.push({ line: lineNo, what: '.control … .endc block (simulator commands)' });
      continue;
    }
    if (word === '.end') {
      const rest = lines.slice(n + 1).findIndex((l) => l.trim() !== '');
      if (rest >= 0) skipped.push({ line: n + 2 + rest, what: 'text after .end' });
      break;
    }
    raw = splitLine(body, lineNo, lead);
    open = { kind: first === '.' ? 'dot' : 'element', line: lineNo, column: lead + 1, words: [], params: [] };
    cards.push(open);
  }
  close();
  // A card made only of "key=value" fields has no name to read it by.
  const named = cards.filter((c) => {
    if (c.kind === 'note' || c.words.length > 0) return true;
    problems.push({ code: 'spice.no-name', severity: 'error', path: [], line: c.line, column: c.column, message: 'this line has no element name, only key=value fields', hint: 'start the line with an element name (R1 …) or join it to the card above with a leading "+"' });
    return false;
  });
  if (inControl)
    problems.push({
      code: 'spice.unclosed-control',
      severity: 'warning',
      path: [],
      line: controlLine,
      column: 1,
      message: 'a .control block is never closed with .endc; everything after it was skipped',
      hint: 'add .endc after the simulator commands',
    });
  return { title, cards: named, problems, skipped };
}
