// Expo's own Babel preset: needed by Metro for the web export and by jest-expo for component tests.
module.exports = function (api) {
  api.cache(true);
  return { presets: ['babel-preset-expo'] };
};
