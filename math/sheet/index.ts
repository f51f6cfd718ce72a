export * from '@/math/sheet/paper';
export * from '@/math/sheet/wrap-text';
export * from '@/math/sheet/print-sheet-svg';
export * from '@/math/sheet/sheet-page';
