/**
 * The demo file the build serves (scripts/demoBundle.ts) and the page's reading of it
 * (state/demo.ts): every voltammogram comes out byte for byte as it is on disk, and a damaged
 * file is refused with what is wrong, never cut into wrong pieces.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { demoBundleBytes } from '../../scripts/demoBundle';
import { demoInputsOf } from '../../src/state/demo';

const encode = (s: string) => new TextEncoder().encode(s);

describe('the demo file', () => {
  it('holds every demo export of demo-data/, byte for byte, in name order', () => {
    const inputs = demoInputsOf(new Uint8Array(demoBundleBytes('demo-data')));
    const names = readdirSync('demo-data').filter((f) => /\.(csv|txt|tsv|dat)$/i.test(f)).sort();
    expect(inputs.map((i) => i.name)).toEqual(names);
    for (const input of inputs) expect(Buffer.from(input.data as Uint8Array).equals(readFileSync(`demo-data/${input.name}`))).toBe(true);
  });

  it('cuts files by the lengths its header line names, bytes of any value included', () => {
    const bytes = new Uint8Array([...encode('{"files":[{"name":"a.csv","bytes":3},{"name":"b.txt","bytes":2}]}\n'), 0x0a, 0xff, 0x41, 0x0d, 0x0a]);
    const inputs = demoInputsOf(bytes);
    expect(inputs.map((i) => [i.name, [...(i.data as Uint8Array)]])).toEqual([['a.csv', [0x0a, 0xff, 0x41]], ['b.txt', [0x0d, 0x0a]]]);
  });

  it('refuses a file that is cut short, has bytes left over or has no header line', () => {
    const head = '{"files":[{"name":"a.csv","bytes":4}]}\n';
    expect(() => demoInputsOf(encode(`${head}abc`))).toThrow(/holds 3 bytes after its header, not the 4/);
    expect(() => demoInputsOf(encode(`${head}abcde`))).toThrow(/holds 5 bytes after its header, not the 4/);
    expect(() => demoInputsOf(encode('no header'))).toThrow(/no header line/);
    expect(() => demoInputsOf(encode('{"files":[{"name":"a.csv","bytes":-1}]}\n'))).toThrow(/not a list of names and lengths/);
  });
});
