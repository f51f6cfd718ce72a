/**
 * The photo storage the server uses: local disk under config.uploadDir
 * (UPLOAD_DIR, default .data/uploads). Swap the implementation here.
 */
import { config } from '@/server/config';
import { localDiskStorage } from './local-disk-storage';
import type { PhotoStorage } from './photo-storage';

export type { PhotoStorage } from './photo-storage';
export { localDiskStorage } from './local-disk-storage';

export const photoStorage: PhotoStorage = localDiskStorage(config.uploadDir);
