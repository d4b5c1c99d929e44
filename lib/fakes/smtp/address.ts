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
    delete g.__baywrightFakeSmtp;
  }
}

export function fakeSmtpAddress(): { host: string; port: number } | null {
  return g.__baywrightFakeSmtp ?? null;
}
