export * from '@/math/flight/integrate-to-range';
export * from '@/math/flight/drag-factor';
export * from '@/math/flight/solve-elevation';
export * from '@/math/flight/sight-model';
export * from '@/math/flight/predict-mark';
export * from '@/math/flight/mark-gradient';
export * from '@/math/flight/crosswind';
