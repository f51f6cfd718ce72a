import { useEffect } from 'react';

import { Button } from '@/components/ui/button';

// On the web the browser prints: a button opens its dialog, and a print
// stylesheet keeps only the comparison (no rail, bars or controls), in black on white.

/** A button that opens the browser's print dialog. */
export function ComparePrintButton({ label = 'Print', testID }: { label?: string; testID?: string }) {
  return <Button label={label} variant="secondary" onPress={() => window.print()} testID={testID} />;
}

/**
 * While mounted, a print stylesheet: only the element with id `rootId` is
 * printed, in normal flow from the top of the first page (long comparisons
 * run on to more pages).
 */
export function ComparePrintOnly({ rootId }: { rootId: string }) {
  useEffect(() => {
    const style = document.createElement('style');
    style.setAttribute('data-pinwright', 'compare-print');
    style.textContent = `
@media print {
  @page { margin: 12mm; }
  html, body, #root { background: #fff !important; height: auto !important; overflow: visible !important; }
  body * { visibility: hidden !important; }
  div { transform: none !important; }
  #root div { overflow: visible !important; height: auto !important; max-height: none !important; }
  #${rootId}, #${rootId} * { visibility: visible !important; }
  #${rootId} { position: absolute !important; left: 0; top: 0; width: 100% !important; max-width: none !important; padding: 0 !important; }
  #${rootId} [role="row"] { break-inside: avoid; }
  /* Printers drop backgrounds by default: print every word black on white so the caution stays legible. */
  #${rootId}, #${rootId} * { color: #000 !important; background-color: transparent !important; }
}`;
    document.head.appendChild(style);
    return () => style.remove();
  }, [rootId]);
  return null;
}
