/** The results workbook of every series: the worker's CSV results sheet, cut into sheets (io/resultsWorkbook.ts). */
import { resultsWorkbook } from '../io/resultsWorkbook';
import type { HalfwaveState, WorkbookSheet } from './types';

export async function workbookSheets(state: HalfwaveState): Promise<WorkbookSheet[]> {
  return resultsWorkbook(await state.exportGroup(null, 'csv'));
}
