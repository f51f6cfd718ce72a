import PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import type { Paper } from '@/shared/fit';
import { PAPER_SIZES_MM } from '@/math/sheet/paper';

/** PostScript points per millimetre: 72 per inch, 25.4 mm per inch (exact). */
export const POINTS_PER_MM = 72 / 25.4;

/**
 * The print sheet SVG (printSheetSvg) as a one-page PDF, true to scale: the
 * page is exactly the paper (A4 595.276 × 841.890 pt, Letter 612 × 792 pt) and
 * the SVG's millimetre viewBox fills it, so 1 mm in the SVG is 1 mm on paper.
 * Node only (pdfkit); the web app prints the SVG itself.
 *
 * Example: await sheetPdf(printSheetSvg(fit, { paper: 'letter' }), 'letter') → <Buffer 25 50 44 46 …> ("%PDF")
 */
export async function sheetPdf(svg: string, paper: Paper, options: { compress?: boolean } = {}): Promise<Buffer> {
  const { widthMm, heightMm } = PAPER_SIZES_MM[paper];
  const widthPt = widthMm * POINTS_PER_MM;
  const heightPt = heightMm * POINTS_PER_MM;
  const doc = new PDFDocument({
    size: [widthPt, heightPt],
    margin: 0,
    compress: options.compress ?? true,
    info: { Title: 'Sight tape', Creator: 'Pinwright' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<void>((resolve, reject) => {
    doc.on('end', () => resolve());
    doc.on('error', reject);
  });
  SVGtoPDF(doc, svg, 0, 0, { width: widthPt, height: heightPt, preserveAspectRatio: 'none' });
  doc.end();
  await finished;
  return Buffer.concat(chunks);
}
