import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { idParamSchema } from '@/shared/common';
import { stepPhotoParamsSchema } from '@/shared/level';
import { ApiError } from '@/server/errors';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { workableStep } from '@/server/services/level-service';
import { attachStepPhoto, detachStepPhoto, maxPhotoBytes, readPhoto } from '@/server/services/photo-service';

/** One file in the "photo" field, held in memory (at most 5 MB), nothing written until its content is checked. */
const receivePhoto: RequestHandler = (req, res, next) => {
  multer({ storage: multer.memoryStorage(), limits: { fileSize: maxPhotoBytes, files: 1, fields: 0 } }).single('photo')(
    req,
    res,
    (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE')
          return next(new ApiError(413, 'too_large', 'The photo is larger than 5 MB; send a smaller one.'));
        return next(ApiError.badRequest('Send one photo in the "photo" field.', { photo: 'Send one photo' }));
      }
      // busboy's own errors (no boundary, a truncated part, a malformed part header, …) are the client's upload, not ours.
      next(
        new ApiError(400, 'bad_upload', 'The upload could not be read; send the photo again as multipart/form-data in the "photo" field.', {
          photo: 'The upload could not be read',
        }),
      );
    },
  );
};

const step = { params: stepPhotoParamsSchema };

/** Refuse early (before reading the upload) when the step is not the user's to work on. */
const stepGuard = route(step, async (req, _res, next) => {
  await workableStep(currentUser(req), req.params.id, req.params.step);
  next();
});

/** Step photos of level checks, and serving a photo to those who may read its bow. */
export function photoRoutes() {
  const router = Router();
  router.post(
    '/checks/:id/steps/:step/photo',
    requireUser,
    stepGuard,
    receivePhoto,
    // The params were checked by stepGuard; checked again here, they come typed (parsing them twice gives the same).
    route(step, async (req, res) => {
      res.status(201).json({ photo: await attachStepPhoto(currentUser(req), req.params.id, req.params.step, req.file) });
    }),
  );
  router.delete(
    '/checks/:id/steps/:step/photo',
    requireUser,
    route(step, async (req, res) => {
      await detachStepPhoto(currentUser(req), req.params.id, req.params.step);
      res.status(204).end();
    }),
  );
  router.get(
    '/photos/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      const photo = await readPhoto(currentUser(req), req.params.id);
      res.set({ 'Content-Type': photo.mimeType, 'Cache-Control': 'private, max-age=3600', 'Content-Disposition': 'inline' });
      res.send(photo.bytes);
    }),
  );
  return router;
}
