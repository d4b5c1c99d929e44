// The sheet's faces read from fonts/ the way the sheet route reads them, for tests that render PDFs.
import path from 'node:path';
import { readSheetFonts } from '@/server/api/sheet-fonts';

export const fontsReady = readSheetFonts(path.join(__dirname, '..', '..', 'fonts'));
