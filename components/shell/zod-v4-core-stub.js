/**
 * Stands in for `zod/v4/core` inside @hookform/resolvers' zod resolver in the
 * web bundle (metro.config.js). Pinwright's schemas are zod 3 (`import { z }
 * from 'zod'`), for which the resolver never touches zod 4's core; importing
 * it would put all of zod 4 and its ~40 message locales (~200 KB minified)
 * in the first download. A zod 4 schema would fail loudly here, not silently.
 */
function refuse() {
  throw new Error('zod 4 schemas are not supported in this bundle: use zod 3 (see metro.config.js)');
}
class $ZodError extends Error {}
module.exports = { parse: refuse, parseAsync: refuse, $ZodError };
