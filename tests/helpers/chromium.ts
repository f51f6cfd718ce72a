/**
 * How the tests and the web bench launch Debian's Chromium (never a downloaded
 * browser). No other imports, so the bench can use it without the app.
 */
/** Also for a persistent profile: chromium.launchPersistentContext(dir, { ...chromiumOptions, … }). */
export const chromiumOptions = {
  executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
  headless: true,
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
};
