import { useEffect } from 'react';

import { bigTap } from '@/components/level/result-buttons';
import { Button } from '@/components/ui/button';

// On the web the browser prints: a button opens its dialog, and a print
// stylesheet hides everything but the sheet (the app's rail and bars included).

/** A "Print" button that opens the browser's print dialog. */
export function PrintButton({ testID }: { testID?: string }) {
  return (
    <Button label="Print this page" variant="secondary" onPress={() => window.print()} style={{ minHeight: bigTap }} testID={testID} />
  );
}

/**
 * While mounted, adds a print stylesheet: only the element with id `rootId` is
 * printed, from the top of the page, in black on white. It is fixed to the page
 * (which escapes the app's scrolling containers), so it prints on one page:
 * the sheet is kept short enough for that.
 */
export function PrintOnly({ rootId }: { rootId: string }) {
  useEffect(() => {
    const style = document.createElement('style');
    style.setAttribute('data-pinwright', 'print-only');
    style.textContent = `
@media print {
  @page { margin: 12mm; }
  html, body { background: #fff !important; height: auto !important; overflow: visible !important; }
  body * { visibility: hidden !important; }
  /* A transformed ancestor (the navigator's screen) would hold a fixed element inside it. */
  div { transform: none !important; }
  #${rootId}, #${rootId} * { visibility: visible !important; }
  #${rootId} { position: fixed !important; left: 0; top: 0; width: 100% !important; max-width: none !important; padding: 0 !important; }
  #${rootId} [data-print="hide"] { display: none !important; }
  #${rootId} [data-print="card"] { break-inside: avoid; }
  #${rootId} [data-print="card"] > div { border-color: #999 !important; background: #fff !important; }
}`;
    document.head.appendChild(style);
    return () => style.remove();
  }, [rootId]);
  return null;
}
