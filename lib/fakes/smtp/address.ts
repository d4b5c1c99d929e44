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
