export * from '@/math/builds/virtual-mass';
