export * from '@/math/fit/fit-input-error';
export * from '@/math/fit/priors';
export * from '@/math/fit/solve-two-marks';
export * from '@/math/fit/map-fit';
export * from '@/math/fit/mark-band';
export * from '@/math/fit/next-distance';
export * from '@/math/fit/fit-sight';
