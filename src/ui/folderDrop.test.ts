/** Folder drops and picks become one batch per folder (hand-made cases; no numeric source). */
import { describe, expect, it } from 'vitest';
import { batchesFromDrop, batchesFromFolderPick, isTableFile } from './folderDrop';

function file(name: string, relativePath = ''): File {
  const f = new File(['E,I\n0,0\n'], name);
  Object.defineProperty(f, 'webkitRelativePath', { value: relativePath });
  return f;
}

function fileEntry(f: File) {
  return { isFile: true, isDirectory: false, name: f.name, file: (ok: (x: File) => void) => ok(f) };
}

function dirEntry(name: string, children: unknown[]) {
  return {
    isFile: false, isDirectory: true, name,
    createReader() {
      let given = false;
      // Hands out the children in one batch, then an empty batch, as browsers do.
      return {
        readEntries: (ok: (e: unknown[]) => void) => {
          const batch = given ? [] : children;
          given = true;
          ok(batch);
        },
      };
    },
  };
}

describe('folder batches', () => {
  it('keeps table files and leaves out hidden and other files', () => {
    expect(['a.csv', 'b.TXT', 'c.tsv', 'd.dat', 'e.asc'].every(isTableFile)).toBe(true);
    expect(['.DS_Store', 'photo.png', 'run.xlsx', '.hidden.csv'].some(isTableFile)).toBe(false);
  });

  it('groups a folder pick by the folder of each relative path', () => {
    const list = [file('b.csv', 'day1/series A/b.csv'), file('a.csv', 'day1/series A/a.csv'), file('x.csv', 'day1/x.csv'), file('notes.png', 'day1/notes.png')];
    const batches = batchesFromFolderPick(list as unknown as FileList);
    expect(batches.map((b) => [b.folder, b.files.map((f) => f.name)])).toEqual([['series A', ['a.csv', 'b.csv']], ['day1', ['x.csv']]]);
  });

  it('reads dropped folders recursively and keeps loose files apart', async () => {
    const loose = file('loose.txt');
    const inner = dirEntry('fast scans', [fileEntry(file('f2.csv')), fileEntry(file('f1.csv'))]);
    const top = dirEntry('ferrocene', [fileEntry(file('s1.csv')), inner, fileEntry(file('.DS_Store'))]);
    const items = [top, fileEntry(loose)].map((entry) => ({ kind: 'file', webkitGetAsEntry: () => entry }));
    const batches = await batchesFromDrop({ items, files: [] } as unknown as DataTransfer);
    expect(batches.map((b) => [b.folder, b.files.map((f) => f.name)])).toEqual([
      ['ferrocene', ['s1.csv']],
      ['fast scans', ['f1.csv', 'f2.csv']],
      [null, ['loose.txt']],
    ]);
  });
});
