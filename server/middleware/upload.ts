// One uploaded file per request, held in memory (never written to disk under the name it came
// with), with a size limit whose 413 names the limit and what the file was for.
import type { RequestHandler } from 'express';
import multer from 'multer';
import { badRequest, tooLarge } from '../lib/http-error';

export function singleUpload(limitBytes: number, what: string): RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: limitBytes, files: 1 } }).single('file');
  const mb = limitBytes / (1024 * 1024);
  return (req, res, next) =>
    handler(req, res, (err?: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        next(tooLarge(`The ${what} is larger than the ${mb >= 1 ? `${mb} MB` : `${limitBytes / 1024} kB`} limit.`));
        return;
      }
      next(err);
    });
}

/** 400 unless the request carried its file (the multipart part named "file"); `what` says what to attach. */
export function requireFile(what: string): RequestHandler {
  return (req, _res, next) => {
    if (!req.file) throw badRequest('no_file', `Attach ${what} as the multipart part named "file".`);
    next();
  };
}
