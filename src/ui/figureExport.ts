/**
 * PNG and SVG of a figure at publication size, made by Plotly in this page (nothing is sent
 * anywhere): 160 × 120 mm at 300 dpi for PNG (1890 × 1416 px), the same shape as SVG; light
 * background, larger type, axis titles with their units as on screen, no toolbar.
 */
import type { Data, Layout } from 'plotly.js';
import { loadPlotly } from './plotlyLoader';
import { downloadUrl } from './download';

const WIDTH_PX = 630;
const HEIGHT_PX = 472;
/** 630 px at scale 3 = 1890 px = 160 mm at 300 dpi. */
const PNG_SCALE = 3;

export function publicationLayout(layout: Partial<Layout>): Partial<Layout> {
  return {
    ...layout,
    width: WIDTH_PX, height: HEIGHT_PX, paper_bgcolor: '#ffffff',
    font: { ...layout.font, family: 'Arial, Helvetica, sans-serif', size: 14 },
    margin: { l: 80, r: 20, t: 40, b: 60 },
    legend: { ...layout.legend, font: { size: 12 } },
  };
}

export async function figureImageUrl(data: Data[], layout: Partial<Layout>, format: 'png' | 'svg'): Promise<string> {
  const Plotly = await loadPlotly();
  return Plotly.toImage({ data, layout: publicationLayout(layout), config: { staticPlot: true } } as unknown as Parameters<typeof Plotly.toImage>[0],
    { format, width: WIDTH_PX, height: HEIGHT_PX, scale: format === 'png' ? PNG_SCALE : 1 });
}

export async function downloadFigure(data: Data[], layout: Partial<Layout>, format: 'png' | 'svg', baseName: string): Promise<void> {
  downloadUrl(`${baseName}.${format}`, await figureImageUrl(data, layout, format));
}
