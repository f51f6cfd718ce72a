export * from '@/math/field/drop-between';
export * from '@/math/field/range-forgiveness';
export * from '@/math/field/field-card';
export * from '@/math/field/air-shift';
export * from '@/math/field/wind-table';
