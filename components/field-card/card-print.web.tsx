import { useEffect, useMemo, type CSSProperties } from 'react';

import type { CardPrintProps } from '@/components/field-card/card-print';
import { Button } from '@/components/ui/button';
import { FIELD_CARD_SIZE_MM } from '@/math/card/field-card-svg';

// On the web the browser prints: the card SVG (mm units) is placed at its true size in a
// print-only box, a print stylesheet hides everything else, and the button opens the dialog.

/**
 * A "Print the card" button and, for paper only, the card at 100 × 150 mm
 * (no scaling: print at 100 % / actual size), cut line included.
 * Example: `<CardPrint svg={fieldCardSvg(card, labels)} />`
 */
export function CardPrint({ svg, testID }: CardPrintProps) {
  const url = useMemo(() => URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' })), [svg]);
  useEffect(() => () => URL.revokeObjectURL(url), [url]);
  useEffect(() => {
    const style = document.createElement('style');
    style.setAttribute('data-pinwright', 'field-card-print');
    style.textContent = `
.pw-card-print { display: none; }
@media print {
  @page { margin: 10mm; }
  html, body, #root { background: #fff !important; height: auto !important; overflow: visible !important; }
  body * { visibility: hidden !important; }
  div { transform: none !important; }
  .pw-card-print, .pw-card-print * { visibility: visible !important; }
  .pw-card-print { display: block !important; position: fixed !important; left: 0; top: 0; }
}`;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
  const size: CSSProperties = { width: `${FIELD_CARD_SIZE_MM.widthMm}mm`, height: `${FIELD_CARD_SIZE_MM.heightMm}mm`, display: 'block' };
  return (
    <>
      <Button label="Print the card" variant="secondary" onPress={() => window.print()} testID={testID} />
      <div className="pw-card-print" aria-hidden="true">
        <img src={url} alt="" style={size} />
      </div>
    </>
  );
}
