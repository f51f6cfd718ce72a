export * from '@/math/units/constants';
export * from '@/math/units/convert';
