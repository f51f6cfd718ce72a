/**
 * A stand-in for one part of a package (expo-router, mostly) that the web build leaves out: a
 * component or function that throws when used, naming the part and the file
 * that explains why, rather than leave a blank or do something else.
 * Example: `leftOut('Header', 'stack-elements.js', 'set headerShown: false')`
 */
module.exports = function leftOut(name, file, advice) {
  function LeftOut() {
    throw new Error(`${name} is left out of the web build${advice ? `: ${advice}` : ''} (see components/shell/router-stand-ins/${file})`);
  }
  LeftOut.displayName = `LeftOut(${name})`;
  return LeftOut;
};
