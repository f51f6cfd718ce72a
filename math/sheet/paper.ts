import { INCH_MM } from '@/math/units/constants';

/**
 * Paper sizes, mm: ISO 216 A4 is 210 × 297 mm; US Letter (ANSI A) is
 * 8.5 × 11 in = 215.9 × 279.4 mm.
 * Example: PAPER_SIZES_MM.letter → { widthMm: 215.9, heightMm: 279.4 }
 */
export const PAPER_SIZES_MM = {
  a4: { widthMm: 210, heightMm: 297 },
  letter: { widthMm: 8.5 * INCH_MM, heightMm: 11 * INCH_MM },
} as const;

/** A paper size name. */
export type PaperName = keyof typeof PAPER_SIZES_MM;
