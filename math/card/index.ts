export * from '@/math/card/field-card-data';
export * from '@/math/card/field-card-svg';
export * from '@/math/card/predicted-tape-svg';
export * from '@/math/card/predicted-sheet-svg';
