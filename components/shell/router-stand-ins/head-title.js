/**
 * Stands in for the document-head library that expo-router bundles, where its
 * Head component (expo-router/head) imports it (metro.config.js). Pinwright's
 * only use of Head is the browser tab's title (components/ui/screen-title.tsx),
 * so this sets `document.title` and nothing else, in a few dozen lines instead
 * of the library's ~12 KB (minified). Like the library, the Head mounted last wins, and when
 * it goes the one before it shows again. Anything but a <title> throws, naming
 * this file, rather than be dropped without a word.
 */
const React = require('react');

const shown = []; // { order, title } of each mounted Head, in no particular order
let mounts = 0;

function showNewest() {
  if (typeof document === 'undefined' || shown.length === 0) return;
  const title = shown.reduce((a, b) => (b.order > a.order ? b : a)).title;
  // The setter replaces the <title>'s text even when it is the same (HTML standard, document.title), so skip that.
  if (document.title !== title) document.title = title;
}

function titleOf(children) {
  let title = null;
  React.Children.forEach(children, (child) => {
    if (child == null || typeof child === 'boolean') return;
    if (child.type !== 'title') {
      throw new Error('Head takes only a <title> in the web build (see components/shell/router-stand-ins/head-title.js)');
    }
    title = React.Children.toArray(child.props.children).join('');
  });
  return title;
}

function Helmet({ children }) {
  // Numbered at first render, so a parent's Head comes before its child's, as in the library.
  const [order] = React.useState(() => ++mounts);
  const title = titleOf(children);
  React.useLayoutEffect(() => {
    if (title === null) return undefined;
    const entry = { order, title };
    shown.push(entry);
    showNewest();
    return () => {
      shown.splice(shown.indexOf(entry), 1);
      showNewest();
    };
  }, [order, title]);
  return null;
}

function HelmetProvider({ children }) {
  return children;
}

module.exports = { Helmet, HelmetProvider };
