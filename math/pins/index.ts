export * from '@/math/pins/pin-positions';
