import type { Request, Response } from 'express';
import multer from 'multer';
import { REPAIR_PHOTO_MAX_BYTES } from '../../shared/schemas/repairs';
import { HttpError } from '../errors';

const photoInvalid = (message: string) => new HttpError(400, 'invalid', 'Check these fields: photo', { fields: { photo: message } });

const upload = multer({
  storage: multer.memoryStorage(),
  // One photo and nothing else worth keeping: no room for large or many text fields.
  limits: { fileSize: REPAIR_PHOTO_MAX_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 5 },
}).single('photo');

/**
 * Reads the one photo of a multipart form (field `photo`) into memory and answers its bytes;
 * what it is gets decided from those bytes (see processPhoto), never from its name or type.
 * Called inside the handler, after the policy and the ticket are checked.
 */
export async function readPhotoUpload(req: Request, res: Response): Promise<Buffer> {
  await new Promise<void>((resolve, reject) => upload(req, res, (error?: unknown) => (error ? reject(translate(error)) : resolve())));
  if (!req.file) throw photoInvalid('Required');
  if (req.file.size === 0) throw photoInvalid('The file is empty');
  return req.file.buffer;
}

function translate(error: unknown) {
  if (error instanceof multer.MulterError) {
    if (error.code === 'LIMIT_FILE_SIZE') {
      return new HttpError(413, 'too_large', `The photo is larger than ${REPAIR_PHOTO_MAX_BYTES / 1024 / 1024} MB`, { fields: { photo: 'Send a smaller photo' } });
    }
    return photoInvalid('Send one photo in the form field "photo"');
  }
  // busboy's own complaints (a cut-off form, a bad boundary): the client's request, not a server fault.
  return new HttpError(400, 'bad_request', 'The upload is not a readable multipart form');
}
