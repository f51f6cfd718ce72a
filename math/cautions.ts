/**
 * The cautions Pinwright shows where the math can mislead someone, in one
 * place so every surface (tape sheet, fit warnings, field card) words them alike.
 * Example: TAPE_CAUTION → 'A printed tape is an estimate until …'
 */

/** On every tape and print sheet. */
export const TAPE_CAUTION = 'A printed tape is an estimate until every distance you will shoot has been confirmed at the range.';
/** Beside slope and altitude corrections. */
export const SLOPE_CAUTION = 'Slope and altitude corrections are estimates; confirm on real terrain.';
/** Beside kinetic energy and momentum. */
export const ENERGY_CAUTION = 'Energy and momentum figures are no legal determination; follow your local hunting regulations.';
/** On the print sheet, before cutting. */
export const PRINT_INSTRUCTION =
  'Print at actual size (100 %, no fit-to-page), then measure the bar: it must read 50 mm and 2 in before you cut.';
/** On a tape, sheet or screen fitted from one mark and a chronographed speed. */
export const ONE_MARK_CAUTION = 'Estimate from one mark and the chronographed speed: no other distance has been sighted.';
/** The short form along a one-mark tape's edge. */
export const ONE_MARK_STRIP = 'ESTIMATE FROM ONE MARK';
/** Beside every crosswind figure. */
export const WIND_CAUTION = 'Wind varies along the path: wind holds are estimates; only practice in wind confirms them.';
