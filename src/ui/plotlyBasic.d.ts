/** The basic Plotly bundle (scatter, bar, pie) has the same API as the full one; its types are plotly.js's. */
declare module 'plotly.js-basic-dist-min' {
  import * as Plotly from 'plotly.js';
  export = Plotly;
}
