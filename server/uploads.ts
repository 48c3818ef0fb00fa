import express, { type NextFunction, type Request, type Response, type Router } from 'express';
import multer from 'multer';
import type passport from 'passport';

import type { User } from '@/modules/accounts/server/user-model';
import { MAX_PHOTO_BYTES } from '@/modules/photos/core/photo-rules';
import type { PhotoStore } from '@/modules/photos/server/photo-store';
import { savePhoto } from '@/modules/photos/server/photo-service';
import { MAX_RECORDING_BYTES } from '@/modules/tone/core/wav';
import { saveRecording } from '@/modules/tone/server/tone-service';

import { requireUser } from './auth';
import { AppError } from './errors';
import { requireContentType } from './requests';

// multer holds one photo in memory (at most 10 MB) so its bytes can be checked before anything is stored.
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 8, fieldSize: 1024, parts: 10 },
}).single('photo');

// A play-test recording: one WAV (at most 48 MB, five minutes), likewise held until its bytes are checked.
const recordingUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_RECORDING_BYTES, files: 1, fields: 4, fieldSize: 256, parts: 6 },
}).single('recording');

function parseWith(handler: typeof upload, field: string, maxBytes: number) {
  return (req: Request, res: Response, next: NextFunction): void => {
    handler(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new AppError('TOO_LARGE', `${field}: must be at most ${maxBytes / 1024 / 1024} MB`, field));
        return next(new AppError('BAD_INPUT', `${err.field ?? 'upload'}: ${err.message}`, err.field));
      }
      next(malformedUpload(err));
    });
  };
}
const parseUpload = parseWith(upload, 'photo', MAX_PHOTO_BYTES);
const parseRecording = parseWith(recordingUpload, 'recording', MAX_RECORDING_BYTES);

// The multipart parser's own failures all come from the bytes the client sent.
function malformedUpload(err: unknown): AppError {
  const message = err instanceof Error ? err.message : String(err);
  if (/boundary not found/i.test(message)) return new AppError('BAD_INPUT', 'upload: the multipart Content-Type names no boundary', 'upload');
  if (/unexpected end of form/i.test(message)) return new AppError('BAD_INPUT', 'upload: the multipart body ends before its end (truncated)', 'upload');
  return new AppError('BAD_INPUT', `upload: the multipart body is malformed (${message})`, 'upload');
}

export function uploadsRouter(pp: passport.PassportStatic, store: PhotoStore): Router {
  const router = express.Router();
  router.post('/photos', requireUser(pp, 'rest'), requireContentType('multipart/form-data'), parseUpload, async (req, res) => {
    const photo = await savePhoto(store, req.user as User, req.body ?? {}, req.file);
    res.status(201).json(photo);
  });
  router.post('/recordings', requireUser(pp, 'rest'), requireContentType('multipart/form-data'), parseRecording, async (req, res) => {
    const recording = await saveRecording(store, req.user as User, req.body ?? {}, req.file);
    res.status(201).json(recording);
  });
  return router;
}
