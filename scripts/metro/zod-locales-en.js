// Stands in for zod's table of every language's messages in the web bundle: the product speaks
// English only, and the full table is a large share of the sign-in screen's JavaScript.
export { default as en } from 'zod/v4/locales/en.js';
