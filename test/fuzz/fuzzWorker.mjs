// Worker entry of the fuzz suite: loads the TypeScript loop through tsx (a worker thread does not
// inherit the test runner's TypeScript loader).
import { tsImport } from 'tsx/esm/api';

await tsImport('./fuzzWorkerLoop.ts', import.meta.url);
