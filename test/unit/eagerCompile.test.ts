// The build's Plotly transform (scripts/eagerCompile.ts) only adds parentheses around the
// functions that run as the bundle loads: the code runs the same, and Plotly's bundle as pinned
// gets all its module bodies wrapped.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { runInNewContext } from 'node:vm';
import { parseAst } from 'vite';
import { describe, expect, it } from 'vitest';
import { parenthesizeLoadTimeFunctions } from '../../scripts/eagerCompile';

// A bundle laid out as the bundler writes Plotly's: a UMD call, a CommonJS and an ES module helper.
const BUNDLE = [
  '(function(root,factory){root.result=factory()})(this,()=>{"use strict";',
  'var W=(e,r)=>()=>{try{return r||e((r={exports:{}}).exports,r),r.exports}catch(t){throw r=0,t}};',
  'var Hu=(e,r,t)=>()=>{if(t)throw t[0];try{return e&&(r=e(e=0)),r}catch(a){throw t=[a],a}};',
  'var later=[];var k;var esm=Hu(()=>{k=40});',
  'var a=W((e,r)=>{r.exports={two:()=>2}});',
  'var b=W(function(e,r){esm();r.exports=a().two()+k;later.push(x=>x*(r.exports))});',
  'return {b:b(),f:later[0](2),s:String(W)};});',
].join('\n');

/** Every parenthesis removed: what is left must not change. */
const withoutParens = (s: string) => s.replace(/[()]/g, '');

describe('parenthesizeLoadTimeFunctions', () => {
  it('wraps the UMD factory and each module body, and the bundle gives the same result', () => {
    const out = parenthesizeLoadTimeFunctions(BUNDLE);
    expect(out.wrapped).toBe(4);
    expect(out.code).toContain('(this,(()=>{');
    expect(out.code).toContain('W(((e,r)=>{r.exports={two:()=>2}}))');
    expect(out.code).toContain('W((function(e,r){');
    expect(out.code).toContain('Hu((()=>{k=40}))');
    expect(withoutParens(out.code)).toBe(withoutParens(BUNDLE));
    const before = runInNewContext(`${BUNDLE};result`, {}) as { b: number; f: number; s: string };
    const after = runInNewContext(`${out.code};result`, {}) as { b: number; f: number; s: string };
    expect(after).toEqual(before);
    expect(after.b).toBe(42);
    expect(after.f).toBe(84);
  });

  it('leaves code without such calls as it is', () => {
    const code = 'var f=(x)=>x+1;[1,2].map(function(v){return f(v)});(()=>{})();';
    expect(parenthesizeLoadTimeFunctions(code)).toEqual({ code, wrapped: 0 });
  });

  it('wraps the pinned Plotly bundle: its ~400 module bodies, the text otherwise unchanged and still valid', () => {
    const require = createRequire(import.meta.url);
    const source = readFileSync(require.resolve('plotly.js-basic-dist-min/plotly-basic.min.js'), 'utf8');
    const out = parenthesizeLoadTimeFunctions(source);
    expect(out.wrapped).toBeGreaterThan(300);
    expect(out.code.length).toBe(source.length + 2 * out.wrapped);
    expect(withoutParens(out.code)).toBe(withoutParens(source));
    expect(() => parseAst(out.code)).not.toThrow();
  });
});
