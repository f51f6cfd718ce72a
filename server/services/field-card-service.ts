/**
 * A sight-in's field card (GET /api/sight-ins/:id/field-card, .svg, .pdf): the
 * slope table and the altitude/temperature shift from the sight-in's fitted
 * model (math/card), as JSON, as a 100 × 150 mm SVG of outline glyphs, and as
 * a one-page PDF of exactly that size. Estimates: confirm on real terrain.
 */
import PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import { ArrowBuild, type User } from '@/server/models';
import { FIELD_CARD_SIZE_MM, fieldCardData, fieldCardSvg } from '@/math';
import { POINTS_PER_MM } from '@/server/print/sheet-pdf';
import type { FieldCardQuery, FieldCardResponse } from '@/shared/field-card';
import { sightInFor } from './bow-access';
import { modelOf, refusingMathInput } from './compare-service';
import type { Download } from './tape-service';

/**
 * The card's data and words for a sight-in the user may read (another
 * account's: 404). Without altitude or temperature the card is for the
 * sight-in's own air.
 * Example: await fieldCard(marit, 31, { angles: [-30, 0, 30], altitudeM: 2700 }) → { card: { rows: [ … ] }, labels: { bow: 'Timberline slider', … } }
 */
export async function fieldCard(user: User, sightInId: number, query: FieldCardQuery): Promise<FieldCardResponse> {
  const { sightIn } = await sightInFor(user, sightInId, 'read');
  const build = await ArrowBuild.findByPk(sightIn.buildId, { attributes: ['name'] });
  const asked = query.altitudeM !== undefined || query.temperatureC !== undefined;
  const card = refusingMathInput(() =>
    fieldCardData(modelOf(sightIn), {
      anglesDeg: query.angles,
      distances: query.distances,
      air: asked ? { altitudeM: query.altitudeM, temperatureC: query.temperatureC } : undefined,
      sightIn: { altitudeM: sightIn.altitudeM, temperatureC: sightIn.temperatureC },
      scaleSign: sightIn.bow.scaleDirection === 'up' ? -1 : 1,
    }),
  );
  return {
    sightInId: sightIn.id,
    bowId: sightIn.bowId,
    card,
    labels: { bow: sightIn.bow.nickname, build: build?.name ?? '', date: sightIn.date, place: sightIn.placeLabel },
  };
}

/** File name stem: "field-card-timberline-slider-2026-11-14". */
function fileStem(response: FieldCardResponse): string {
  const slug = response.labels.bow
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 40);
  return `field-card-${slug || 'bow'}-${response.labels.date}`;
}

/** The card as SVG or PDF, for download or print. */
export async function fieldCardDownload(user: User, sightInId: number, query: FieldCardQuery, format: 'svg' | 'pdf'): Promise<Download> {
  const response = await fieldCard(user, sightInId, query);
  const svg = fieldCardSvg(response.card, response.labels);
  if (format === 'svg') return { body: svg, contentType: 'image/svg+xml; charset=utf-8', fileName: `${fileStem(response)}.svg` };
  return { body: await cardPdf(svg), contentType: 'application/pdf', fileName: `${fileStem(response)}.pdf` };
}

/**
 * The card SVG as a one-page PDF whose page is exactly the card (100 × 150 mm
 * = 283.46 × 425.20 pt at 72/25.4 pt per mm), the mm viewBox filling it, so it
 * prints true to size. Example: await cardPdf(fieldCardSvg(card, labels)) → <Buffer 25 50 44 46 …>
 */
export async function cardPdf(svg: string): Promise<Buffer> {
  const widthPt = FIELD_CARD_SIZE_MM.widthMm * POINTS_PER_MM;
  const heightPt = FIELD_CARD_SIZE_MM.heightMm * POINTS_PER_MM;
  const doc = new PDFDocument({
    size: [widthPt, heightPt],
    margin: 0,
    compress: true,
    info: { Title: 'Field card', Creator: 'Pinwright' },
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
