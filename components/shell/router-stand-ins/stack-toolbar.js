/**
 * Stands in for the stack's toolbar (Stack.Toolbar and its buttons, menus and
 * search slot: expo-router's copy, for iOS and Android headers) where
 * expo-router's stack utilities import it (metro.config.js), and for the two
 * text helpers Stack.Title takes from the toolbar's shared file. Pinwright
 * draws its own header (components/shell/app-shell.tsx) and uses none of
 * these (tests/unit/router-stand-ins.test.ts checks that), so each is here by
 * name only and throws if used. The stack only compares its children with
 * `StackToolbar` by identity, which a stand-in answers just as well: no child
 * is ever it.
 */
const leftOut = require('./left-out');

const why = 'Pinwright draws its own header';
// Every name the toolbar's index exports (the stack utilities re-export them all).
for (const name of [
  'StackToolbar',
  'StackToolbarBadge',
  'StackToolbarButton',
  'StackToolbarIcon',
  'StackToolbarLabel',
  'StackToolbarMenu',
  'StackToolbarMenuAction',
  'StackToolbarSearchBarSlot',
  'StackToolbarSpacer',
  'StackToolbarView',
  'appendStackToolbarPropsToOptions',
  // from the toolbar's shared file, read by Stack.Title
  'areAllChildrenPrimitiveValues',
  'convertChildrenToString',
])
  exports[name] = leftOut(name, 'stack-toolbar.js', why);
