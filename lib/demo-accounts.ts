/** The invented demo workshop's accounts (used by the seed, the home page in demo mode and the e2e tests). */
export const DEMO_PASSWORD = 'baywright-demo';

export const DEMO_STUDIO = 'Saltmarsh Van Works';

export const DEMO_ACCOUNTS = [
  { email: 'maren@saltmarsh.test', name: 'Maren Holt', role: 'owner', what: 'workshop owner', password: DEMO_PASSWORD },
  { email: 'ivo@saltmarsh.test', name: 'Ivo Brandt', role: 'designer', what: 'designer', password: DEMO_PASSWORD },
  { email: 'priya@client.test', name: 'Priya Nair', role: 'client', what: 'client with a weekender van', password: DEMO_PASSWORD },
  { email: 'tom@client.test', name: 'Tom Adeyemi', role: 'client', what: 'client with a touring van', password: DEMO_PASSWORD },
] as const;
