/**
 * Stands in for the native tab bar's trigger where expo-router's layout
 * helper imports it (metro.config.js). The helper asks of each child of a
 * layout whether it is a native tab trigger, that is whether it is that very
 * component. Pinwright never imports the native tabs
 * (tests/unit/router-stand-ins.test.ts checks that), so no child can be one
 * and the answer is always no; the tab bar's icon and option code is left out.
 */
const leftOut = require('./left-out');

exports.isNativeTabTrigger = () => false;
exports.convertTabPropsToOptions = leftOut('convertTabPropsToOptions', 'native-tab-trigger.js');
