export function templatePath(): string;
export function templateFor(dataDir: string): Blob | undefined;
