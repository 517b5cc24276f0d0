/**
 * The demo voltammograms (demo-data/, written by `npm run demo-data`) served to the page as one
 * file, so that a first visit fetches them in one request instead of one per file. The page
 * learns its address from a `<link rel="preload" as="fetch" id="halfwave-demo">` that this plugin
 * puts into index.html; the preload starts the download while the page's script is still loading.
 * The build emits the file as a hashed asset; the dev server makes it from the files on disk.
 *
 * Layout (read by state/demo.ts): one line of JSON, `{"files":[{"name":"…","bytes":63722},…]}`,
 * a line feed, then each file's bytes as they are on disk, one after another in that order. The
 * page cuts the files out of it without decoding or copying them.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Plugin } from 'vite';

const DEV_PATH = '/halfwave-demo-voltammograms.bin';
const ASSET_NAME = 'demo-voltammograms.bin';
/** The preload link's id: state/demo.ts finds the file's address by it. */
const DEMO_LINK_ID = 'halfwave-demo';

/** The demo exports of a folder, in name order (the folder's README is not one). */
export function demoFileNames(dir: string): string[] {
  return readdirSync(dir).filter((f) => /\.(csv|txt|tsv|dat)$/i.test(f)).sort();
}

/** The demo files of a folder, in name order, as one file. */
export function demoBundleBytes(dir: string): Uint8Array {
  const names = demoFileNames(dir);
  const files = names.map((name) => ({ name, data: readFileSync(join(dir, name)) }));
  const head = Buffer.from(`${JSON.stringify({ files: files.map((f) => ({ name: f.name, bytes: f.data.length })) })}\n`, 'utf8');
  return new Uint8Array(Buffer.concat([head, ...files.map((f) => f.data)]));
}

export function demoBundle(dir: string): Plugin {
  let building = false;
  return {
    name: 'halfwave-demo-bundle',
    configResolved(config) {
      building = config.command === 'build';
    },
    configureServer(server) {
      server.middlewares.use(DEV_PATH, (_req, res) => {
        res.setHeader('Content-Type', 'application/octet-stream');
        res.end(demoBundleBytes(dir));
      });
    },
    buildStart() {
      if (building) this.emitFile({ type: 'asset', name: ASSET_NAME, source: demoBundleBytes(dir) });
    },
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        let href = `.${DEV_PATH}`;
        if (ctx.bundle) {
          const asset = Object.values(ctx.bundle).find((a) => a.type === 'asset' && a.names.includes(ASSET_NAME));
          if (!asset) throw new Error(`the build holds no ${ASSET_NAME} (scripts/demoBundle.ts)`);
          href = `./${asset.fileName}`;
        }
        return [{ tag: 'link', attrs: { rel: 'preload', as: 'fetch', crossorigin: true, id: DEMO_LINK_ID, href }, injectTo: 'head' }];
      },
    },
  };
}
