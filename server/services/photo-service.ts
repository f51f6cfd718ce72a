/**
 * Photos of level-check steps: accepted by their content (JPEG, PNG or WebP,
 * recognised from the file's first bytes by file-type, never by its name or
 * the browser's claim), at most 5 MB, stored by the photo storage under a
 * random name, and served only to someone who may read the bow.
 */
import FileType from 'file-type';
import { ApiError } from '@/server/errors';
import { Photo, type User } from '@/server/models';
import { canReadBow } from '@/server/services/bow-access';
import { photoJson, workableStep } from '@/server/services/level-service';
import { photoStorage } from '@/server/storage';
import type { Photo as PhotoJson } from '@/shared/level';
import type { PhotoMimeType } from '@/server/models/photo';

/** Largest photo accepted, in bytes (5 MB = 5 × 1024 × 1024). */
export const maxPhotoBytes = 5 * 1024 * 1024;

const accepted: Record<string, { mime: PhotoMimeType; extension: 'jpg' | 'png' | 'webp' }> = {
  'image/jpeg': { mime: 'image/jpeg', extension: 'jpg' },
  'image/png': { mime: 'image/png', extension: 'png' },
  'image/webp': { mime: 'image/webp', extension: 'webp' },
};

/**
 * The photo's type from its content, or a 415 when it is not a JPEG, PNG or WebP image.
 * Example: await photoTypeOf(jpegBytes) → { mime: 'image/jpeg', extension: 'jpg' }
 */
export async function photoTypeOf(bytes: Buffer) {
  const detected = await FileType.fromBuffer(bytes);
  const type = detected ? accepted[detected.mime] : undefined;
  if (!type) {
    throw new ApiError(415, 'unsupported_type', 'The photo must be a JPEG, PNG or WebP image; this file is not one, whatever its name says.');
  }
  return type;
}

/** POST /api/checks/:id/steps/:step/photo: the step's photo (replacing an earlier one). */
export async function attachStepPhoto(user: User, checkId: number, stepKey: string, file: { buffer: Buffer; size: number } | undefined): Promise<PhotoJson> {
  const { check, step } = await workableStep(user, checkId, stepKey);
  if (!file || file.size === 0) throw ApiError.badRequest('Choose a photo to upload.', { photo: 'Choose a photo to upload' });
  if (file.size > maxPhotoBytes) throw new ApiError(413, 'too_large', 'The photo is larger than 5 MB; send a smaller one.');
  const type = await photoTypeOf(file.buffer);
  const storageKey = await photoStorage.put(file.buffer, type.extension);
  let photo: Photo;
  try {
    photo = await Photo.create({ bowId: check.bowId, userId: user.id, storageKey, mimeType: type.mime, sizeBytes: file.size });
  } catch (error) {
    await photoStorage.remove(storageKey);
    throw error;
  }
  const previous = step.photo ?? null;
  step.photoId = photo.id;
  await step.save();
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
  const photo = await Photo.findByPk(id);
  if (!photo || !(await canReadBow(user, photo.bowId))) throw ApiError.notFound('That photo');
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
