/**
 * The SHA-256 an import reports for a file (worker/handlers.ts, hashed beside the reading) is the
 * digest of the file's bytes as given, checked against Node's OpenSSL implementation of FIPS 180-4
 * (NIST, Secure Hash Standard, 2015), for a file that reads and for one that is refused.
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { simulatedCsv } from '../../src/state/testSupport';
import { handlers, type HandlerContext } from '../../src/worker/handlers';

const ctx: HandlerContext = { progress: () => undefined, signal: new AbortController().signal };

describe('the hash of an imported file', () => {
  it('is the SHA-256 of its bytes, and the reading is the same as without it', async () => {
    const bytes = new TextEncoder().encode(simulatedCsv(0.1));
    const expected = createHash('sha256').update(bytes).digest('hex');
    const out = await handlers.import({ fileName: 'nernst.csv', data: bytes.slice().buffer, overrides: {} }, ctx);
    expect(out.sha256).toBe(expected);
    expect(out.measurement.potentialV.length).toBeGreaterThan(100);
  });

  it('a file that cannot be read fails with its reason, not with the hash', async () => {
    const bytes = new TextEncoder().encode('no voltammogram here\n');
    await expect(handlers.import({ fileName: 'note.txt', data: bytes.slice().buffer, overrides: {} }, ctx)).rejects.toThrow(/note\.txt/);
  });
});
