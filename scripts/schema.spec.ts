import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { foldCase, schemaFiles, SCHEMA_DIR } from './schema.ts';

describe('static/schema', () => {
  const files = schemaFiles();
  it('writes the three documents', () => {
    expect(Object.keys(files).sort()).toEqual(['circuit.schema.json', 'layout.schema.json', 'project.schema.json']);
  });
  it.each(Object.keys(files))('%s matches the code (run `npm run schema` after changing a schema)', (file) => {
    expect(readFileSync(join(SCHEMA_DIR, file), 'utf8')).toBe(files[file]);
  });
  it('describes the input form: defaulted fields are optional', () => {
    const circuit = JSON.parse(files['circuit.schema.json']!) as { required: string[]; properties: Record<string, unknown> };
    expect(circuit.required.sort()).toEqual(['format', 'parts', 'version']);
    expect(circuit.properties.format).toMatchObject({ const: 'kerfline.circuit' });
  });
  it('spells out case-insensitive patterns, which JSON Schema cannot flag', () => {
    const src = foldCase('^DIP-(4|8)$');
    expect(src).toBe('^[Dd][Ii][Pp]-(4|8)$');
    const re = new RegExp(src);
    expect(['DIP-8', 'dip-8', 'Dip-4'].every((s) => re.test(s))).toBe(true);
    expect(re.test('DIP-6')).toBe(false);
    expect(foldCase('[a-c]\\d')).toBe('[a-cA-C]\\d');
  });
});
