/**
 * Printing the before-a-trip sheet. Native apps have no print dialog here, so
 * these render nothing; print-support.web.tsx has the web versions.
 */

/** A "Print" button (web only). */
export function PrintButton(_props: { testID?: string }) {
  return null;
}

/** The print stylesheet that keeps only the element with `rootId` on paper (web only). */
export function PrintOnly(_props: { rootId: string }) {
  return null;
}
