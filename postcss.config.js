/* global module */
// Tailwind v4 through PostCSS; the client's build finds this file by searching up from client/.
module.exports = { plugins: { '@tailwindcss/postcss': {} } };
