import { expect, it } from 'vitest';
import { readArgs } from './args.ts';

it('separates files, flags and options, and names the first mistake', () => {
  const r = readArgs(['a.json', '--json', '--out', 'dir', 'b.json'], { flags: ['--json'], options: ['--out'] });
  expect(r.files).toEqual(['a.json', 'b.json']);
  expect(r.flags.has('--json')).toBe(true);
  expect(r.options.get('--out')).toBe('dir');
  expect(r.error).toBeUndefined();
  expect(readArgs(['--out'], { options: ['--out'] }).error).toBe('--out needs a value');
  expect(readArgs(['--out', '--json'], { flags: ['--json'], options: ['--out'] }).error).toBe('--out needs a value');
  expect(readArgs(['-x', 'a'], {}).error).toBe('unknown option -x');
});
