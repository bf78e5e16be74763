import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError, ValidationError } from './errors.js';

/** The largest CSV an import takes. */
export const MAX_IMPORT_BYTES = 1024 * 1024;

const CSV_TYPES = new Set(['text/csv', 'application/csv', 'text/plain', 'application/vnd.ms-excel', 'text/comma-separated-values']);

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_IMPORT_BYTES, files: 1, fields: 10 },
  fileFilter: (_req, file, cb) => {
    const looksCsv = CSV_TYPES.has(file.mimetype.toLowerCase()) && /\.(csv|txt)$/i.test(file.originalname);
    if (looksCsv) return cb(null, true);
    cb(new HttpError(415, 'unsupported_media_type', `"${file.originalname}" is not a CSV file (text/csv, .csv)`));
  },
}).single('file');

/** One CSV file in the form field "file", in memory; multer's errors as problems: 413 over 1 MB, 400 for a malformed upload. */
export const uploadCsv: RequestHandler = (req, res, next) => {
  upload(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'too_large', 'The file is larger than 1 MB'));
      return next(ValidationError.field('file', `The upload could not be read (${err.message})`));
    }
    next(err);
  });
};

/** The uploaded file's bytes, or 400 naming `file`. */
export function uploadedFile(req: Express.Request): Buffer {
  if (!req.file) throw ValidationError.field('file', 'Attach a CSV file (form field "file")');
  return req.file.buffer;
}
