/**
 * The "new version is ready" notice. Pinwright ships only a web app; the
 * service worker that makes updates wait exists only there (update-notice.web.tsx).
 */
export function UpdateNotice() {
  return null;
}
