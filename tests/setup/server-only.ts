// Stands in for the 'server-only' marker under vitest, which runs outside React's server build.
export {};
