/**
 * The first module the page evaluates (main.tsx imports it before anything else): it starts
 * reading the demo file, which the page's preload link has been downloading, while the browser
 * evaluates React and the rest of the app. Read later, after them, its bytes would reach the
 * workers a tenth of a second later on a two-core machine. A restored workspace leaves it
 * unused (state/app.ts startApp); a demo that cannot be read comes back as a problem, never as a
 * rejection (state/demo.ts).
 */
import { fetchDemoInputs, type DemoInputs } from '../state/demo';

export const demoReading: Promise<DemoInputs> = fetchDemoInputs();
