export * from '@/math/numeric/brent-root';
export * from '@/math/numeric/symmetric-matrix';
