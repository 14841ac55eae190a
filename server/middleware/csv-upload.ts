import type { Request, Response } from 'express';
import multer from 'multer';
import { SCHEDULE_FILE_MAX_BYTES } from '../../shared/schemas/schedule';
import { HttpError } from '../errors';

const fileInvalid = (message: string) => new HttpError(400, 'invalid', 'Check these fields: file', { fields: { file: message } });

// Browsers on Windows label .csv as Excel; the name is the surer sign, the content is checked after.
const CSV_TYPES = ['text/csv', 'application/csv', 'application/vnd.ms-excel', 'text/plain'];
const isCsv = (file: Express.Multer.File) => /\.csv$/i.test(file.originalname) || CSV_TYPES.includes(file.mimetype);

const upload = multer({
  storage: multer.memoryStorage(),
  // The form carries the file and nothing else: no room for large or many text fields.
  limits: { fileSize: SCHEDULE_FILE_MAX_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 5 },
  fileFilter: (_req, file, accept) => (isCsv(file) ? accept(null, true) : accept(fileInvalid('Send a CSV file (.csv)'))),
}).single('file');

/**
 * Reads the one CSV file of a multipart form (field `file`) into memory and returns its text.
 * Called inside the handler, after the policy check, so a caller without the capability never
 * gets as far as uploading.
 */
export async function readCsvUpload(req: Request, res: Response): Promise<string> {
  await new Promise<void>((resolve, reject) => upload(req, res, (error?: unknown) => (error ? reject(translate(error)) : resolve())));
  if (!req.file) throw fileInvalid('Required');
  const text = req.file.buffer.toString('utf8');
  if (text.includes('\uFFFD')) throw fileInvalid('Save the file as CSV in UTF-8');
  return text;
}

function translate(error: unknown) {
  if (error instanceof HttpError) return error;
  if (error instanceof multer.MulterError) {
    if (error.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'too_large', 'The file is larger than 1 MB');
    return fileInvalid('Send one CSV file in the form field "file"');
  }
  // busboy's own complaints (a cut-off form): the client's request, not a server fault.
  return new HttpError(400, 'bad_request', 'The upload is not a readable multipart form');
}
