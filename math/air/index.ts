export * from '@/math/air/standard-atmosphere';
