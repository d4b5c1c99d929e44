/**
 * Whether this process may use local stand-ins for what production must be given: the fake mail
 * server, the fake payment API, a generated auth secret. Outside production (`next dev`, scripts,
 * vitest) always; with NODE_ENV=production only when the demo or a test script asks for them
 * (BAYWRIGHT_DEMO=1 or BAYWRIGHT_LOCAL_FAKES=1). BAYWRIGHT_LOCAL_FAKES=0 turns them off anywhere.
 * The one place that decides it; reads nothing but the environment. Also the one door to the fakes
 * themselves (dev/fakes): production code reaches them only through `startLocalStandIns`, and the mail
 * transport finds the fake mail server through the address kept here.
 */
type Env = Record<string, string | undefined>;

export function localStandInsAllowed(env: Env = process.env): boolean {
  if (env.BAYWRIGHT_LOCAL_FAKES === '0') return false;
  if (env.BAYWRIGHT_LOCAL_FAKES === '1' || env.BAYWRIGHT_DEMO === '1') return true;
  return env.NODE_ENV !== 'production';
}

/** Starts the local fakes this process wants (dev/fakes/local-services) where stand-ins are allowed; else nothing is loaded. */
export async function startLocalStandIns(env: Env = process.env): Promise<void> {
  if (!localStandInsAllowed(env)) return;
  const { startLocalServices } = await import('../dev/fakes/local-services');
  await startLocalServices();
}

/**
 * Where this process's development mail server listens, once it is listening: shared through
 * globalThis (and the environment) so the mail transport finds it from any module instance.
 * Must never hold anything but the address.
 */
type GlobalWithSmtp = typeof globalThis & { __baywrightFakeSmtp?: { host: string; port: number } };
const g = globalThis as GlobalWithSmtp;

export function setFakeSmtpAddress(address: { host: string; port: number } | null): void {
  if (address) {
    g.__baywrightFakeSmtp = address;
    process.env.BAYWRIGHT_SMTP_PORT = String(address.port);
  } else {
    // Forget the address, and the environment copy if it is still ours, so nothing sends to a closed port.
    if (g.__baywrightFakeSmtp && process.env.BAYWRIGHT_SMTP_PORT === String(g.__baywrightFakeSmtp.port)) delete process.env.BAYWRIGHT_SMTP_PORT;
    delete g.__baywrightFakeSmtp;
  }
}

export function fakeSmtpAddress(): { host: string; port: number } | null {
  return g.__baywrightFakeSmtp ?? null;
}
