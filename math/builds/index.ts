export * from '@/math/builds/virtual-mass';
export * from '@/math/builds/build-summary';
export * from '@/math/builds/predict-build';
