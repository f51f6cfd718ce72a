/**
 * Stands in for the page preview that a long press on a Link shows on iOS
 * (Link.Preview), where expo-router's link elements import it
 * (metro.config.js). Pinwright uses no Link.Preview
 * (tests/unit/router-stand-ins.test.ts checks that), so it throws if drawn.
 */
exports.HrefPreview = require('./left-out')('HrefPreview', 'href-preview.js', 'Pinwright uses no Link.Preview');
