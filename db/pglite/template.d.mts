export function templatePath(): string;
export function templateFor(dataDir: string): Blob | undefined;
export function migratedTemplatePath(migrationsFolder?: string): string;
export function migratedTemplate(migrationsFolder?: string): Promise<{ file: string; made: boolean }>;
export function emptyCluster(): Blob | undefined;
