export * from '@/math/arrow/total-grains';
export * from '@/math/arrow/foc';
export * from '@/math/arrow/kinetic-energy';
