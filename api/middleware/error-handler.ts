import type { ErrorRequestHandler } from 'express';
import multer from 'multer';
import { ZodError } from 'zod';
import { AppError } from '../errors';

/** The one place errors become responses: `{ error: { code, message, details? } }`. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  if (res.headersSent) return;
  if (error instanceof ZodError) {
    const details = error.issues.map((issue) => ({ path: issue.path.map(String), message: issue.message }));
    const where = details.map((d) => `${d.path.join('.') || '(body)'}: ${d.message}`).join('; ');
    res.status(400).json({ error: { code: 'VALIDATION_FAILED', message: `Invalid input — ${where}`, details } });
    return;
  }
  if (error instanceof AppError) {
    res.status(error.status).json({ error: { code: error.code, message: error.message, details: error.details } });
    return;
  }
  if (error instanceof multer.MulterError) {
    const tooLarge = error.code === 'LIMIT_FILE_SIZE';
    res.status(tooLarge ? 413 : 400).json({
      error: { code: tooLarge ? 'FILE_TOO_LARGE' : 'UPLOAD_INVALID', message: error.message, details: { field: error.field } },
    });
    return;
  }
  if (error?.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'BODY_TOO_LARGE', message: 'The request body is too large' } });
    return;
  }
  if (error?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'MALFORMED_JSON', message: 'The request body is not valid JSON' } });
    return;
  }
  req.log?.error({ err: error }, 'unhandled error');
  res.status(500).json({ error: { code: 'INTERNAL', message: 'Something went wrong on the server' } });
};
