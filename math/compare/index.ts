export * from '@/math/compare/mark-slope';
export * from '@/math/compare/compare-builds';
