// Tailwind v4 runs as a PostCSS plugin; globals.css loads tailwind.config.ts through @config (STACK.md).
const config = { plugins: { '@tailwindcss/postcss': {} } };

export default config;
