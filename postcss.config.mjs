// Tailwind CSS v4 runs as a PostCSS plugin; it reads tailwind.config.ts through @config in app/globals.css.
const config = { plugins: { '@tailwindcss/postcss': {} } };
export default config;
