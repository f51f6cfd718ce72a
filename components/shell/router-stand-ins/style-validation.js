/**
 * Stands in, in production web builds only (metro.config.js), for the CSS value
 * parser that react-native-web's style checker imports. react-native-web checks
 * styles in development builds only (StyleSheet.create calls its checker behind
 * `process.env.NODE_ENV !== 'production'`), so in production the parser is
 * imported but never called. If it ever is, this throws and says why.
 */
module.exports = require('./left-out')('postcss-value-parser', 'style-validation.js', 'react-native-web checks styles in development only');
