/**
 * Whether this process may use local stand-ins for what production must be given: the fake mail
 * server, the fake payment API, a generated auth secret. Outside production (`next dev`, scripts,
 * vitest) always; with NODE_ENV=production only when the demo or a test script asks for them
 * (BAYWRIGHT_DEMO=1 or BAYWRIGHT_LOCAL_FAKES=1). BAYWRIGHT_LOCAL_FAKES=0 turns them off anywhere.
 * The one place that decides it; reads nothing but the environment.
 */
type Env = Record<string, string | undefined>;

export function localStandInsAllowed(env: Env = process.env): boolean {
  if (env.BAYWRIGHT_LOCAL_FAKES === '0') return false;
  if (env.BAYWRIGHT_LOCAL_FAKES === '1' || env.BAYWRIGHT_DEMO === '1') return true;
  return env.NODE_ENV !== 'production';
}
