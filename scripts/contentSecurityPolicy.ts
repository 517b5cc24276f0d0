/**
 * The Content-Security-Policy of the built page, written into dist/index.html by a build-only
 * Vite plugin (the dev server injects its own inline scripts and styles, so it runs without it).
 * Everything comes from the page's own origin: scripts (no inline script, no eval), styles, the
 * analysis workers (same-origin files, so no blob:), fonts and connections; images also from
 * blob: and data: URLs, which the figure export draws through (an image cannot run script); no plugins,
 * no <base> or form targets elsewhere. Source: W3C, Content Security Policy Level 3 (2024
 * working draft), directives and hash sources.
 *
 * Two inline stylesheets are allowed by their SHA-256 hash instead of 'unsafe-inline': Plotly
 * (plotly.js-basic-dist-min 4.1.1) creates <style id="plotly.js-style-global"> empty and fills it
 * through CSSOM insertRule (which CSP does not govern), and inserts the map traces' stylesheet at
 * load. A Plotly upgrade that changes the second one shows up as a violation in the Chromium
 * CSP spec (test/browser/csp.test.ts), whose message gives the new hash.
 */
import type { Plugin } from 'vite';

const PLOTLY_STYLE_HASHES = [
  // SHA-256 of the empty string: the empty <style> Plotly fills through CSSOM.
  "'sha256-47DEQpj8HBSa+/TImW+5JCeuQeRkm5NMpJWZG3hSuFU='",
  // Plotly's map-trace stylesheet, inserted at load although the app draws no maps.
  "'sha256-2GF9hCGTDj/GGFNlQA54jDdMGl2fvoeZmZjAvBSiAtM='",
];

export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  `style-src 'self' ${PLOTLY_STYLE_HASHES.join(' ')}`,
  // Figure export: Plotly draws its SVG as a data: image onto a canvas, and the PNG is saved from a blob:.
  "img-src 'self' blob: data:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join('; ');

/** Puts the policy right after <meta charset>, before any script or stylesheet of the page. */
export function contentSecurityPolicy(): Plugin {
  return {
    name: 'halfwave-content-security-policy',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(html) {
        const meta = `<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}" />`;
        if (!/<meta charset="UTF-8" \/>/.test(html)) throw new Error('index.html has no <meta charset="UTF-8" /> to put the CSP after');
        return html.replace('<meta charset="UTF-8" />', `<meta charset="UTF-8" />\n    ${meta}`);
      },
    },
  };
}
