/**
 * The page's Content-Security-Policy refuses eval (scripts/contentSecurityPolicy.ts), so no
 * source file may build code from strings: eval, new Function, Function(...), or a string handed
 * to setTimeout/setInterval. Comments are left out; every file under src/ is read.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = join(import.meta.dirname, '..', '..', 'src');

function listSources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return listSources(p);
    return /\.(tsx?|mjs|js)$/.test(name) ? [p] : [];
  });
}

const CODE_FROM_STRINGS = /\beval\s*\(|\bnew\s+Function\b|(?<![.\w])Function\s*\(|\bset(?:Timeout|Interval)\s*\(\s*['"`]/;

export function findCodeFromStrings(source: string): string | null {
  const code = source.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:])\/\/.*$/gm, '$1');
  return CODE_FROM_STRINGS.exec(code)?.[0] ?? null;
}

describe('no code built from strings in src/', () => {
  it('the check finds eval, new Function, Function() and string timers, and passes plain code', () => {
    for (const bad of ['eval("1")', 'const f = new Function("return 1")', 'Function("x")()', "setTimeout('go()', 10)"]) expect(findCodeFromStrings(bad)).not.toBeNull();
    for (const ok of ['// eval("1") in a comment', 'evaluate(x)', 'setTimeout(() => go(), 10)', 'x.Function(1)', 'type F = Function;']) expect(findCodeFromStrings(ok)).toBeNull();
  });

  it('no file under src/ uses them', () => {
    const hits = listSources(SRC).flatMap((f) => {
      const hit = findCodeFromStrings(readFileSync(f, 'utf8'));
      return hit ? [`${relative(SRC, f)}: ${hit}`] : [];
    });
    expect(hits).toEqual([]);
  });
});
