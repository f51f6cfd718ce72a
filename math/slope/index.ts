export * from '@/math/slope/slope-shot';
