/**
 * A build-only Vite plugin: the functions that Plotly's bundle runs as it loads are wrapped in
 * parentheses, so the engine compiles them with the script, off the page's thread, instead of
 * one by one on the page's thread when each is first called.
 *
 * Why: V8 compiles a function lazily, at its first call, unless it is written in parentheses (a
 * "parenthesised function", which the engine takes as a sign that it runs at once; V8 blog,
 * T. Verwaest and M. Hölttä, "Blazingly fast parsing, part 2: lazy parsing", 2019, from memory).
 * Plotly's bundle is one UMD call whose factory, 1 MB of code, and its ~400 module bodies are
 * plain arrows passed as arguments; on a first visit, compiling them on the page's thread took
 * about 0.4–0.6 s before the first plot (Chromium CPU profile of the demo). Wrapped, the demo was
 * shown about 0.27 s sooner (12 alternating fresh pages, 11 faster). Marking every function of
 * the file for eager compilation instead (V8's `//# allFunctionsCalledOnLoad`) compiled code that
 * never runs and was slower.
 *
 * What is wrapped (nothing else changes; the code runs exactly as before):
 * - a function passed to a function expression that is called on the spot (the UMD factory);
 * - the single function passed to the bundler's module helpers, found by their definitions:
 *   `(e, r) => () => { try { return r || e((r = { exports: {} }).exports, r), r.exports } … }`
 *   (a CommonJS module body) and `(e, r, t) => () => { if (t) throw t[0]; try { return e && (r =
 *   e(e = 0)), r } … }` (an ES module body).
 */
import { parseAst, type Plugin } from 'vite';

interface Node {
  type: string;
  start: number;
  end: number;
  [key: string]: unknown;
}

const COMMONJS_HELPER = /var ([A-Za-z_$][\w$]*)=\(([A-Za-z_$][\w$]*),([A-Za-z_$][\w$]*)\)=>\(\)=>\{try\{return \3\|\|\2\(\(\3=\{exports:\{\}\}\)\.exports,\3\)/g;
const ESM_HELPER = /var ([A-Za-z_$][\w$]*)=\(([A-Za-z_$][\w$]*),([A-Za-z_$][\w$]*),([A-Za-z_$][\w$]*)\)=>\(\)=>\{if\(\4\)throw \4\[0\];try\{return \2&&\(\3=\2\(\2=0\)\),\3\}/g;

const isFunction = (n: Node | undefined): n is Node => n?.type === 'ArrowFunctionExpression' || n?.type === 'FunctionExpression';

/** The source with those functions in parentheses, and how many were wrapped. */
export function parenthesizeLoadTimeFunctions(code: string): { code: string; wrapped: number } {
  const helpers = new Set([...code.matchAll(COMMONJS_HELPER), ...code.matchAll(ESM_HELPER)].map((m) => m[1] as string));
  const spans: Array<[number, number]> = [];
  const visit = (value: unknown): void => {
    if (Array.isArray(value)) {
      for (const v of value) visit(v);
      return;
    }
    if (!value || typeof value !== 'object') return;
    const node = value as Node;
    if (node.type === 'CallExpression') {
      const callee = node.callee as Node;
      const args = node.arguments as Node[];
      if (callee.type === 'FunctionExpression' || callee.type === 'ArrowFunctionExpression') {
        for (const a of args) if (isFunction(a)) spans.push([a.start, a.end]);
      } else if (callee.type === 'Identifier' && helpers.has(callee.name as string) && args.length === 1 && isFunction(args[0])) {
        spans.push([args[0].start, args[0].end]);
      }
    }
    for (const key in node) if (key !== 'type' && key !== 'start' && key !== 'end') visit(node[key]);
  };
  visit(parseAst(code));
  const cuts = spans.flatMap(([from, to]) => [[from, '('], [to, ')']] as Array<[number, string]>).sort((a, b) => a[0] - b[0]);
  const parts: string[] = [];
  let at = 0;
  for (const [pos, text] of cuts) {
    parts.push(code.slice(at, pos), text);
    at = pos;
  }
  parts.push(code.slice(at));
  return { code: parts.join(''), wrapped: spans.length };
}

/** `moduleId`: the end of the bundled file's path, e.g. `plotly.js-basic-dist-min/plotly-basic.min.js`. */
export function eagerCompile(moduleId: string, leastWrapped: number): Plugin {
  return {
    name: 'halfwave-eager-compile',
    apply: 'build',
    transform(code, id) {
      if (!id.replaceAll('\\', '/').endsWith(moduleId)) return null;
      const out = parenthesizeLoadTimeFunctions(code);
      // A new version laid out differently would silently lose the gain: say so instead.
      if (out.wrapped < leastWrapped) throw new Error(`${moduleId}: only ${out.wrapped} load-time functions found to wrap (expected at least ${leastWrapped}); check scripts/eagerCompile.ts against this version`);
      return { code: out.code, map: null };
    },
  };
}
