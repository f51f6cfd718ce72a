/**
 * What Pinwright does, in one paragraph: the sign-in page's lead, and the text
 * of the static first screen that index.html shows while the script is on its
 * way (server/tools/web-export.ts), so what shows first is what stays.
 */
export const PRODUCT_LEAD =
  "Pinwright turns a few marks sighted in at the range into a sight tape for every distance, printed true to size, and keeps your bow's set-up, level checks and tapes in one place.";
