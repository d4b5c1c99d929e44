/**
 * Display units. Documents always hold integer millimetres; mm, cm and inches are a preference of
 * the person looking. This is the one place that converts between them.
 */
export const LENGTH_UNITS = ['mm', 'cm', 'in'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

/** 25.4 mm to the inch exactly (international yard and pound agreement, 1959). */
export const MM_PER_INCH = 25.4;

export function formatLength(mm: number, unit: LengthUnit = 'mm'): string {
  switch (unit) {
    case 'mm':
      return `${Math.round(mm)} mm`;
    case 'cm':
      return `${trimZeros((mm / 10).toFixed(1))} cm`;
    case 'in':
      return `${trimZeros((mm / MM_PER_INCH).toFixed(2))} in`;
  }
}

/** A plan size, length by width, the unit said once: "600 × 300 mm". */
export function formatSize(lengthMm: number, widthMm: number, unit: LengthUnit = 'mm'): string {
  const bare = formatLength(lengthMm, unit).slice(0, -(unit.length + 1));
  return `${bare} × ${formatLength(widthMm, unit)}`;
}

/** A bare number in the given unit, for form fields. */
export function toUnit(mm: number, unit: LengthUnit): number {
  if (unit === 'mm') return Math.round(mm);
  if (unit === 'cm') return Math.round(mm) / 10;
  return Math.round((mm / MM_PER_INCH) * 100) / 100;
}

/**
 * Reads what a person typed: `2400`, `240 cm`, `94.5in`, `94.5"`, `1.2 m`. A bare number is read in
 * `defaultUnit`. Returns whole millimetres, or null when the text is not a length.
 */
export function parseLength(text: string, defaultUnit: LengthUnit = 'mm'): number | null {
  const match = /^\s*(-?\d+(?:[.,]\d+)?)\s*(mm|cm|m|in|inch|inches|")?\s*$/i.exec(text);
  if (!match) return null;
  const value = Number(match[1].replace(',', '.'));
  if (!Number.isFinite(value)) return null;
  const unit = (match[2] ?? defaultUnit).toLowerCase();
  const factor = unit === 'mm' ? 1 : unit === 'cm' ? 10 : unit === 'm' ? 1000 : MM_PER_INCH;
  return Math.round(value * factor);
}

function trimZeros(s: string): string {
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}
