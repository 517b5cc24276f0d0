/**
 * The results workbook (io/resultsWorkbook.ts: one sheet per series, the files with SHA-256 and
 * layout, the method and parameters) written as XLSX in this page by write-excel-file, which is
 * loaded only when a workbook is asked for (its own chunk).
 */
import type { WorkbookSheet } from '../state/types';

export async function workbookBlob(sheets: WorkbookSheet[]): Promise<Blob> {
  const { default: writeXlsxFile } = await import('write-excel-file/universal');
  return writeXlsxFile(sheets.map((s) => ({ sheet: s.name, data: s.rows.map((r) => r.map((v) => (v === null ? null : { value: v }))) }))).toBlob();
}
