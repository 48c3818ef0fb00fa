// Stands in for zod's table of 60-odd locales in the web bundles: Feltwire speaks English, and the
// others were about a quarter of the staff app's JavaScript. zod itself registers English by default.
export { default as en } from 'zod/v4/locales/en.js';
