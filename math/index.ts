/**
 * Pinwright's trajectory core: pure TypeScript, no React, server or Node-only
 * imports, so the web app (Metro), the server and the command line share it.
 * Re-exported by topic; see math/README.md for the model and the contract.
 */
export * from '@/math/units';
export * from '@/math/air';
export * from '@/math/numeric';
export * from '@/math/flight';
export * from '@/math/fit';
export * from '@/math/arrow';
export * from '@/math/builds';
export * from '@/math/slope';
export * from '@/math/tape';
export * from '@/math/sheet';
export * from '@/math/pins';
export * from '@/math/field';
export * from '@/math/cautions';
export * from '@/math/compare';
export * from '@/math/card';
export type { FitInput, TapeOptionsInput, SheetOptionsInput, Paper } from '@/shared/fit';
