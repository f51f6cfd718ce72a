/**
 * Stands in for expo-router's built-in "page not found" view, where the router
 * imports it (metro.config.js): for an address no route matches, the router
 * shows Pinwright's own not-found screen, the one app/+not-found.tsx shows,
 * rather than a second design of its own.
 */
const React = require('react');

exports.Unmatched = function Unmatched() {
  return React.createElement(require('../../ui/not-found-screen').NotFoundScreen);
};
