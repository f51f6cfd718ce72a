/**
 * Printing the comparison. Native apps have no print dialog here, so these
 * render nothing; compare-print.web.tsx has the web versions.
 */

/** A "Print" button (web only). */
export function ComparePrintButton(_props: { label?: string; testID?: string }) {
  return null;
}

/** The print stylesheet that keeps only the element with id `rootId` on paper (web only). */
export function ComparePrintOnly(_props: { rootId: string }) {
  return null;
}
