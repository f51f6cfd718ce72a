export * from '@/math/tape/glyphs';
export * from '@/math/tape/text-path';
export * from '@/math/tape/tape-layout';
export * from '@/math/tape/tape-svg';
