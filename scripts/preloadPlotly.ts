/**
 * A build-only Vite plugin: a `<link rel="modulepreload">` for the Plotly chunk in dist/index.html.
 * The browser then fetches and compiles Plotly while the page starts, but runs it only when the
 * app imports it (ui/plotlyLoader.ts, once the first files are with the workers). Without it the
 * 1 MB download would begin at that import and hold up the first plot.
 */
import type { Plugin } from 'vite';

export function preloadPlotly(): Plugin {
  return {
    name: 'halfwave-preload-plotly',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(html, ctx) {
        const chunk = Object.values(ctx.bundle ?? {}).find((c) => c.type === 'chunk' && c.isDynamicEntry && c.moduleIds.some((id) => id.includes('plotly.js-basic-dist-min')));
        if (!chunk) throw new Error('no Plotly chunk in the bundle to preload (ui/plotlyLoader.ts should import plotly.js-basic-dist-min lazily)');
        return [{ tag: 'link', attrs: { rel: 'modulepreload', crossorigin: true, href: `./${chunk.fileName}` }, injectTo: 'head' }];
      },
    },
  };
}
