/**
 * Stands in for expo-router's generated `/_sitemap` screen in the web bundle
 * (metro.config.js). app.json turns that route off (`"sitemap": false`), so
 * the router never renders it; without this stand-in its code would still be
 * in the first download, because expo-router requires it unconditionally.
 */
function Sitemap() {
  throw new Error('The /_sitemap route is turned off in app.json (see metro.config.js)');
}
function getNavOptions() {
  return {};
}
module.exports = { Sitemap, getNavOptions };
