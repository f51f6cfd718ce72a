import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState, type CSSProperties } from 'react';

import { apiFetch } from '@/components/api/client';
import type { PrintSheetScreenProps } from '@/components/print/print-sheet-screen';
import { TRY_SHEET_STORAGE_KEY } from '@/components/print/try-sheet';
import { TAPE_VIEW_CAUTION } from '@/components/tapes/tape-form-values';
import { ScreenTitle } from '@/components/ui/screen-title';
import { colors, fonts } from '@/components/theme';
import { PAPER_SIZES_MM, type PaperName } from '@/math/sheet/paper';

// The web's print path: the sheet SVG (mm units) shown at its true size with CSS
// @page { size; margin: 0 } and no scaling, then the browser's own print dialog.

/** The paper of a sheet query (the server's default is letter). */
function paperOf(query: string): PaperName {
  return new URLSearchParams(query).get('paper') === 'a4' ? 'a4' : 'letter';
}

/**
 * The print-only CSS: the page size, no margins, nothing but the sheet, at its
 * true size (on screen the preview shrinks to fit a phone; on paper it never does).
 */
function printCss(paper: PaperName): string {
  const size = paper === 'a4' ? 'A4' : 'letter';
  // 8.5 in × 25.4 is 215.89999999999998 in binary floating point: write whole micrometres.
  const widthMm = Number(PAPER_SIZES_MM[paper].widthMm.toFixed(3));
  const heightMm = Number(PAPER_SIZES_MM[paper].heightMm.toFixed(3));
  return `
@page { size: ${size}; margin: 0; }
@media print {
  html, body, #root, #root * { overflow: visible !important; }
  html, body, #root { height: auto !important; background: #fff !important; }
  .pw-no-print { display: none !important; }
  .pw-print-area { padding: 0 !important; margin: 0 !important; background: #fff !important; height: auto !important; }
  .pw-sheet { box-shadow: none !important; margin: 0 !important; width: ${widthMm}mm !important; height: ${heightMm}mm !important; max-width: none !important; }
}`;
}

/**
 * The print page (web): fetches the sheet SVG for a sight-in (GET
 * /api/sight-ins/:id/sheet.svg) or for the try-it page (POST /api/try/sheet.svg
 * with the request it left in sight-in storage), shows it at 100 % on its paper,
 * and opens the print dialog once it has loaded. Outside the app shell.
 * Example: route /print/sheet?sight-in=4&from=20&to=80&paper=a4
 */
export function PrintSheetScreen({ sightInId, query, source }: PrintSheetScreenProps) {
  const paper = paperOf(query);
  const size = PAPER_SIZES_MM[paper];
  const sheet = useQuery<string, Error>({
    queryKey: ['print-sheet', source ?? 'sightIn', sightInId ?? 0, query],
    queryFn: () => {
      if (source === 'try') {
        const stored = typeof sessionStorage === 'undefined' ? null : sessionStorage.getItem(TRY_SHEET_STORAGE_KEY);
        if (!stored) throw new Error('Nothing to print: make the tape on the try-it page first.');
        return apiFetch('/api/try/sheet.svg', { method: 'POST', body: JSON.parse(stored) as unknown, responseType: 'text' });
      }
      if (!sightInId) throw new Error('Nothing to print: open the tape of a sight-in first.');
      return apiFetch(`/api/sight-ins/${sightInId}/sheet.svg?${query}`, { headers: { Accept: 'image/svg+xml' }, responseType: 'text' });
    },
    retry: false,
    staleTime: Infinity,
  });
  const url = useMemo(() => (sheet.data ? URL.createObjectURL(new Blob([sheet.data], { type: 'image/svg+xml' })) : null), [sheet.data]);
  useEffect(() => () => (url ? URL.revokeObjectURL(url) : undefined), [url]);
  const printed = useRef(false);
  const [loaded, setLoaded] = useState(false);
  const autoPrint = new URLSearchParams(query).get('print') !== '0';

  const onLoad = () => {
    setLoaded(true);
    if (autoPrint && !printed.current) {
      printed.current = true;
      // Let the image paint before the dialog freezes the page.
      setTimeout(() => window.print(), 150);
    }
  };
  const back = source === 'try' ? '/try' : sightInId ? `/sight-ins/${sightInId}/tape` : '/';

  return (
    <div className="pw-print-area" style={styles.page}>
      <ScreenTitle name="Print sheet" />
      <style>{printCss(paper)}</style>
      <div className="pw-no-print" style={styles.bar}>
        <div style={styles.barRow}>
          <a href={back} style={styles.link}>
            ← Back
          </a>
          <button type="button" style={styles.button} onClick={() => window.print()} disabled={!loaded} data-testid="print-again">
            Print
          </button>
        </div>
        <p style={styles.caution} data-testid="print-caution">
          <strong>Caution. </strong>
          {TAPE_VIEW_CAUTION}
        </p>
        <p style={styles.note}>
          In the print dialog choose {paper === 'a4' ? 'A4' : 'Letter'} paper, scale 100 % (“Actual size”), margins none. The preview here
          is shrunk to fit your screen; the printed sheet is true size.
        </p>
        {sheet.isPending ? <p style={styles.note}>Drawing the sheet…</p> : null}
        {sheet.isError ? (
          <p style={styles.error} role="alert" data-testid="print-error">
            {sheet.error.message}
          </p>
        ) : null}
      </div>
      {url ? (
        <img
          className="pw-sheet"
          src={url}
          alt="Print sheet: the tape at 100 %, its scale variants and the calibration bar"
          data-testid="print-sheet"
          data-paper={paper}
          onLoad={onLoad}
          // On screen: as wide as the paper or the screen, whichever is less, keeping its shape; printed: true size (printCss).
          style={{
            ...styles.sheet,
            width: `min(100%, ${size.widthMm}mm)`,
            height: 'auto',
            aspectRatio: `${size.widthMm} / ${size.heightMm}`,
          }}
        />
      ) : null}
    </div>
  );
}

const styles: Record<string, CSSProperties> = {
  page: { height: '100%', overflow: 'auto', backgroundColor: colors.sunken, padding: 16, boxSizing: 'border-box' },
  bar: { maxWidth: 760, margin: '0 auto 16px', fontFamily: fonts.body, color: colors.ink },
  barRow: { display: 'flex', gap: 16, alignItems: 'center', flexWrap: 'wrap' },
  link: { color: colors.signal, fontFamily: fonts.bold, fontSize: 17, minHeight: 48, display: 'inline-flex', alignItems: 'center' },
  button: {
    minHeight: 48,
    padding: '0 20px',
    borderRadius: 10,
    border: `1.5px solid ${colors.signal}`,
    backgroundColor: colors.signal,
    color: colors.onSignal,
    fontFamily: fonts.bold,
    fontSize: 16,
    cursor: 'pointer',
  },
  caution: {
    backgroundColor: colors.cautionGround,
    color: colors.onCaution,
    borderLeft: `6px solid ${colors.cautionAccent}`,
    borderRadius: 10,
    padding: 16,
    fontSize: 17,
    lineHeight: '26px',
  },
  note: { fontSize: 15, lineHeight: '22px', color: colors.inkSoft },
  error: { fontSize: 17, color: colors.failed, fontFamily: fonts.bold },
  sheet: { display: 'block', margin: '0 auto', backgroundColor: '#fff', boxShadow: '0 2px 12px rgba(0,0,0,0.2)', maxWidth: '100%' },
};
