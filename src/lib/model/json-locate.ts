/**
 * Find where a JSON path points in the source text, so a problem can name a line and
 * column as well as its path. A small tolerant scanner; returns undefined when the path
 * does not exist in the text (for example a missing key: then the parent is reported).
 */
export interface TextPosition {
  line: number;
  column: number;
}

export function offsetToLineColumn(text: string, offset: number): TextPosition {
  let line = 1;
  let col = 1;
  const end = Math.min(offset, text.length);
  for (let i = 0; i < end; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      col = 1;
    } else col++;
  }
  return { line, column: col };
}

/** Offset of the value at `path`, or of the deepest existing ancestor. */
export function locateJsonOffset(text: string, path: (string | number)[]): number | undefined {
  let i = 0;
  const n = text.length;
  const ws = () => {
    while (i < n && /\s/.test(text[i]!)) i++;
  };
  const skipString = () => {
    i++;
    while (i < n && text[i] !== '"') i += text[i] === '\\' ? 2 : 1;
    i++;
  };
  const readString = (): string => {
    const start = i;
    skipString();
    try {
      return JSON.parse(text.slice(start, i)) as string;
    } catch {
      return text.slice(start + 1, i - 1);
    }
  };
  const skipValue = (): void => {
    ws();
    const c = text[i];
    if (c === '"') return skipString();
    if (c === '{' || c === '[') {
      const close = c === '{' ? '}' : ']';
      i++;
      ws();
      if (text[i] === close) {
        i++;
        return;
      }
      for (;;) {
        ws();
        if (c === '{') {
          skipString();
          ws();
          i++; // colon
        }
        skipValue();
        ws();
        if (text[i] === ',') {
          i++;
          continue;
        }
        i++;
        return;
      }
    }
    while (i < n && !/[\s,\]}]/.test(text[i]!)) i++;
  };

  let found = 0;
  ws();
  found = i;
  for (const seg of path) {
    ws();
    const c = text[i];
    if (c === '{' && typeof seg === 'string') {
      i++;
      let hit = false;
      for (;;) {
        ws();
        if (text[i] !== '"') break;
        const key = readString();
        ws();
        i++; // colon
        ws();
        if (key === seg) {
          hit = true;
          break;
        }
        skipValue();
        ws();
        if (text[i] === ',') i++;
        else break;
      }
      if (!hit) return found;
      found = i;
    } else if (c === '[' && typeof seg === 'number') {
      i++;
      let k = 0;
      let hit = false;
      for (;;) {
        ws();
        if (text[i] === ']' || i >= n) break;
        if (k === seg) {
          hit = true;
          break;
        }
        skipValue();
        ws();
        k++;
        if (text[i] === ',') i++;
        else break;
      }
      if (!hit) return found;
      found = i;
    } else return found;
    if (i >= n) return found;
  }
  return found;
}

export function locateJsonPath(text: string, path: (string | number)[]): TextPosition | undefined {
  try {
    const off = locateJsonOffset(text, path);
    return off === undefined ? undefined : offsetToLineColumn(text, off);
  } catch {
    return undefined;
  }
}

/**
 * Offset of the first character where `text` stops being JSON (RFC 8259), `text.length`
 * when it ends too early, or undefined when it is valid. For syntax errors whose engine
 * message gives no position (V8 says only "Unexpected token …" or "Unexpected end").
 */
export function jsonErrorOffset(text: string): number | undefined {
  let i = 0;
  const n = text.length;
  const stop = (): never => {
    throw new SyntaxError(String(i));
  };
  const ws = () => {
    while (i < n && ' \t\n\r'.includes(text[i]!)) i++;
  };
  const str = () => {
    i++;
    while (i < n && text[i] !== '"') {
      if (text.charCodeAt(i) < 0x20) stop();
      if (text[i] === '\\') {
        i++;
        if (text[i] === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 1, i + 5))) stop();
          i += 5;
        } else if (i < n && '"\\/bfnrt'.includes(text[i]!)) i++;
        else stop();
      } else i++;
    }
    if (i >= n) stop();
    i++;
  };
  const list = (close: string, item: () => void) => {
    i++;
    ws();
    if (text[i] === close) return void i++;
    for (;;) {
      item();
      ws();
      if (text[i] === ',') i++;
      else if (text[i] === close) return void i++;
      else stop();
    }
  };
  const value = (): void => {
    ws();
    const c = text[i];
    if (c === '{')
      list('}', () => {
        ws();
        if (text[i] !== '"') stop();
        str();
        ws();
        if (text[i] !== ':') stop();
        i++;
        value();
      });
    else if (c === '[') list(']', value);
    else if (c === '"') str();
    else {
      const m = /^(?:true|false|null|-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?)/.exec(text.slice(i, i + 400));
      if (!m) stop();
      i += m![0].length;
    }
  };
  try {
    value();
    ws();
    return i < n ? i : undefined;
  } catch (e) {
    // Too deep to scan (RangeError): no position rather than a wrong one.
    return e instanceof SyntaxError ? Math.min(Number(e.message), n) : undefined;
  }
}
