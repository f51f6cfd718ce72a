/**
 * Photos of level-check steps: decoded as images (JPEG, PNG or WebP, told by
 * their content, never by their name or the browser's claim), at most 5 MB,
 * turned upright by their EXIF orientation and re-encoded, so nothing of the
 * file's metadata (EXIF with GPS position, XMP, comments, text chunks) is
 * stored; stored by the photo storage under a random name, and served only to
 * someone who may read the bow.
 */
import sharp from 'sharp';
import { ApiError } from '@/server/errors';
import { Photo, type User } from '@/server/models';
import { photoFor } from '@/server/services/bow-access';
import { photoJson, workableStep } from '@/server/services/level-service';
import { photoStorage } from '@/server/storage';
import type { Photo as PhotoJson } from '@/shared/level';
import type { PhotoMimeType } from '@/server/models/photo';

/** Largest photo accepted, in bytes (5 MB = 5 × 1024 × 1024). */
export const maxPhotoBytes = 5 * 1024 * 1024;

/** Most pixels decoded (a 50-megapixel phone photo); a small file that claims far more is a decompression bomb. */
export const maxPhotoPixels = 50_000_000;

type PhotoType = { mime: PhotoMimeType; extension: 'jpg' | 'png' | 'webp' };

const accepted: Record<string, PhotoType> = {
  jpeg: { mime: 'image/jpeg', extension: 'jpg' },
  png: { mime: 'image/png', extension: 'png' },
  webp: { mime: 'image/webp', extension: 'webp' },
};

const notAnImage = () =>
  new ApiError(
    415,
    'unsupported_type',
    'The photo must be a JPEG, PNG or WebP image; this file is not one (or is damaged), whatever its name says.',
  );

/**
 * The photo decoded, turned upright and re-encoded in its own format with no
 * metadata at all (sharp writes none unless asked to), or a 415 when the
 * bytes do not decode completely as a JPEG, PNG or WebP image.
 * Example: await cleanPhoto(phoneJpeg) → { type: { mime: 'image/jpeg', extension: 'jpg' }, bytes: <JPEG without EXIF> }
 */
export async function cleanPhoto(bytes: Buffer): Promise<{ type: PhotoType; bytes: Buffer }> {
  let format: string | undefined;
  try {
    format = (await sharp(bytes, { limitInputPixels: maxPhotoPixels }).metadata()).format;
  } catch {
    throw notAnImage();
  }
  const type = format ? accepted[format] : undefined;
  if (!type) throw notAnImage();
  try {
    // failOn 'truncated': a cut-off file is refused rather than stored half grey.
    const image = sharp(bytes, { failOn: 'truncated', limitInputPixels: maxPhotoPixels }).rotate();
    const encoded =
      type.extension === 'jpg'
        ? image.jpeg({ quality: 90, mozjpeg: false })
        : type.extension === 'png'
          ? image.png()
          : image.webp({ quality: 90 });
    return { type, bytes: await encoded.toBuffer() };
  } catch {
    throw notAnImage();
  }
}

/** POST /api/checks/:id/steps/:step/photo: the step's photo (replacing an earlier one). */
export async function attachStepPhoto(
  user: User,
  checkId: number,
  stepKey: string,
  file: { buffer: Buffer; size: number } | undefined,
): Promise<PhotoJson> {
  const { check, step } = await workableStep(user, checkId, stepKey);
  if (!file || file.size === 0) throw ApiError.badRequest('Choose a photo to upload.', { photo: 'Choose a photo to upload' });
  if (file.size > maxPhotoBytes) throw new ApiError(413, 'too_large', 'The photo is larger than 5 MB; send a smaller one.');
  const { type, bytes } = await cleanPhoto(file.buffer);
  const storageKey = await photoStorage.put(bytes, type.extension);
  let photo: Photo | null = null;
  const previous = step.photo ?? null;
  try {
    photo = await Photo.create({ bowId: check.bowId, userId: user.id, storageKey, mimeType: type.mime, sizeBytes: bytes.length });
    step.photoId = photo.id;
    await step.save();
  } catch (error) {
    // Nothing half-stored: neither a row nobody points at nor a file without a row.
    await photo?.destroy().catch(() => {});
    await photoStorage.remove(storageKey);
    throw error;
  }
  if (previous) await removePhoto(previous);
  return photoJson(photo);
}

/** DELETE /api/checks/:id/steps/:step/photo */
export async function detachStepPhoto(user: User, checkId: number, stepKey: string): Promise<void> {
  const { step } = await workableStep(user, checkId, stepKey);
  const previous = step.photo ?? null;
  if (!previous) throw ApiError.notFound('A photo of that step');
  step.photoId = null;
  await step.save();
  await removePhoto(previous);
}

async function removePhoto(photo: Photo) {
  await photo.destroy();
  await photoStorage.remove(photo.storageKey);
}

/** GET /api/photos/:id: the bytes and type, for someone who may read the photo's bow; else 404. */
export async function readPhoto(user: User, id: number): Promise<{ mimeType: PhotoMimeType; bytes: Buffer }> {
  const { photo } = await photoFor(user, id, 'read');
  const bytes = await photoStorage.get(photo.storageKey);
  if (!bytes) throw ApiError.notFound('That photo');
  return { mimeType: photo.mimeType, bytes };
}

/**
 * Storage keys of every photo of a bow, taken before the bow is deleted (the
 * database cascade removes the rows but cannot reach the files).
 * Example: const keys = await photoKeysOfBow(3); await bow.destroy(); await removeStoredPhotos(keys);
 */
export async function photoKeysOfBow(bowId: number): Promise<string[]> {
  return (await Photo.findAll({ where: { bowId }, attributes: ['storageKey'] })).map((photo) => photo.storageKey);
}

/** Removes the stored files under `keys` (missing ones are fine). */
export async function removeStoredPhotos(keys: readonly string[]): Promise<void> {
  for (const key of keys) await photoStorage.remove(key);
}
