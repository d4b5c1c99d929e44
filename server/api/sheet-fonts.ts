import 'server-only';
/**
 * Reads the plan sheet's faces from `fonts/` once per process, unwraps them from WOFF and hands
 * their bytes to the PDF renderer. A missing file is a broken deployment: it throws, and the sheet route answers 500
 * rather than printing in some other face.
 */
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { SHEET_FONT_FILES, type SheetFonts } from '@/lib/sheet/fonts';
import { woffToSfnt } from './woff';

let loading: Promise<SheetFonts> | null = null;

export function sheetFonts(): Promise<SheetFonts> {
  loading ??= readSheetFonts(path.join(process.cwd(), 'fonts')).catch((err) => {
    loading = null;
    throw err;
  });
  return loading;
}

export async function readSheetFonts(dir: string): Promise<SheetFonts> {
  const read = (file: string) => readFile(path.join(dir, file)).then((b) => woffToSfnt(new Uint8Array(b)));
  const [sans, bold, mono] = await Promise.all([read(SHEET_FONT_FILES.sans), read(SHEET_FONT_FILES['sans-bold']), read(SHEET_FONT_FILES.mono)]);
  return { sans, 'sans-bold': bold, mono };
}
