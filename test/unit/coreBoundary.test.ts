/**
 * The numeric core must stay pure: no DOM, React, Node built-ins, timers, worker globals or app
 * layers. This test reads every file under src/core and fails on a forbidden import or global.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const CORE = join(import.meta.dirname, '..', '..', 'src', 'core');

function listTs(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return listTs(p);
    return /\.tsx?$/.test(name) && !name.endsWith('.test.ts') ? [p] : [];
  });
}

const FORBIDDEN_MODULES = /^(node:|fs$|path$|os$|child_process$|react|react-dom|zustand|plotly|papaparse)|\/(io|worker|state|ui|cli)\//;
const FORBIDDEN_GLOBALS = /\b(document\.|window\.|self\.|localStorage|sessionStorage|indexedDB|setTimeout|setInterval|requestAnimationFrame|process\.|require\(|fetch\()/;

export function findViolations(source: string): string[] {
  const out: string[] = [];
  for (const m of source.matchAll(/(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)) {
    const spec = m[1] ?? m[2] ?? '';
    if (FORBIDDEN_MODULES.test(spec)) out.push(`imports ${spec}`);
  }
  const code = source.replace(/\/\*[\s\S]*?\*\//g, '').replace(/\/\/.*$/gm, '');
  const g = code.match(FORBIDDEN_GLOBALS);
  if (g) out.push(`uses ${g[0]}`);
  return out;
}

describe('core purity (architecture rule of this project)', () => {
  it('the detector catches a React import and a DOM global', () => {
    expect(findViolations("import { useState } from 'react';")).toEqual(['imports react']);
    expect(findViolations("import x from '../io/parseTable';")).toEqual(['imports ../io/parseTable']);
    expect(findViolations('const el = document.body;')).toEqual(['uses document.']);
    expect(findViolations('const w = window.innerWidth;')).toEqual(['uses window.']);
    // A smoothing `window` field is a number of points, not the browser global.
    expect(findViolations('const { window } = options; const n = window + 1;')).toEqual([]);
    expect(findViolations("import type { A } from './types';")).toEqual([]);
  });

  it('no file under src/core imports the DOM, React, Node or an app layer', () => {
    const files = listTs(CORE);
    expect(files.length).toBeGreaterThan(0);
    const bad = files.flatMap((f) => findViolations(readFileSync(f, 'utf8')).map((v) => `${relative(CORE, f)}: ${v}`));
    expect(bad).toEqual([]);
  });
});

describe('core purity by the compiler (src/core/tsconfig.json: ECMAScript library only)', () => {
  it('a core file that uses document, window, process or a Node module does not type-check', () => {
    const dir = mkdtempSync(join(tmpdir(), 'halfwave-core-probe-'));
    try {
      const probes: Record<string, string> = {
        'usesDocument.ts': 'export const title = document.title;\n',
        'usesWindow.ts': 'export const width = window.innerWidth;\n',
        'usesProcess.ts': 'export const home = process.env.HOME;\n',
        'usesNodeFs.ts': "import { readFileSync } from 'node:fs';\nexport const read = readFileSync;\n",
        'pure.ts': 'export const twice = (x: number): number => 2 * x;\n',
      };
      for (const [name, body] of Object.entries(probes)) writeFileSync(join(dir, name), body);
      writeFileSync(join(dir, 'tsconfig.json'), JSON.stringify({ extends: join(CORE, 'tsconfig.json'), include: ['*.ts'], exclude: [] }));
      const tsc = join(CORE, '..', '..', 'node_modules', 'typescript', 'bin', 'tsc');
      const r = spawnSync(process.execPath, [tsc, '--noEmit', '-p', join(dir, 'tsconfig.json')], { encoding: 'utf8' });
      expect(r.status).not.toBe(0);
      for (const name of ['usesDocument.ts', 'usesWindow.ts', 'usesProcess.ts', 'usesNodeFs.ts']) expect(r.stdout).toContain(name);
      expect(r.stdout).not.toContain('pure.ts');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
