import multer from 'multer';
import type { RequestHandler } from 'express';
import { BadRequestError, PayloadTooLargeError } from './errors';

/**
 * Receives one file from a multipart/form-data body (field `file`) into memory, refusing more
 * than `limitBytes` with 413 and a malformed body with 400. The other form fields arrive in
 * `req.body` as text. Used by evidence uploads and bulk imports.
 */
export function receiveOneFile(limitBytes: number): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: limitBytes, files: 1, fields: 20, fieldSize: 64 * 1024 } }).single('file');
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (!error) return next();
      const e = error as { code?: string; message?: string; field?: string };
      if (e.code === 'LIMIT_FILE_SIZE') return next(new PayloadTooLargeError(`The file is larger than the upload limit of ${formatBytes(limitBytes)}`));
      if (e.code === 'LIMIT_UNEXPECTED_FILE' || e.code === 'LIMIT_FILE_COUNT') return next(new BadRequestError('Send exactly one file, in the form field "file"'));
      if (e.code?.startsWith('LIMIT_')) return next(new BadRequestError(`The form is too large: ${e.message}`));
      next(new BadRequestError(`The multipart body cannot be read: ${e.message ?? 'malformed'}`));
    });
  };
}

/** The uploaded file, or a 400 that says how to send one. */
export function requireFile(file: Express.Multer.File | undefined): Express.Multer.File {
  if (!file) throw new BadRequestError('Send the file as multipart/form-data in the form field "file"');
  return file;
}

export function formatBytes(n: number): string {
  if (n >= 1024 * 1024) return `${(n / (1024 * 1024)).toFixed(n % (1024 * 1024) === 0 ? 0 : 1)} MiB`;
  if (n >= 1024) return `${(n / 1024).toFixed(n % 1024 === 0 ? 0 : 1)} KiB`;
  return `${n} bytes`;
}

/** A file name safe to store and to send back in Content-Disposition: no path, no control characters. */
export function safeFileName(name: string | undefined, fallback = 'file'): string {
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex
  const cleaned = base.replace(/[\u0000-\u001f\u007f]/g, '').trim();
  if (!cleaned || cleaned === '.' || cleaned === '..') return fallback;
  if (cleaned.length <= 255) return cleaned;
  const dot = cleaned.lastIndexOf('.');
  const ext = dot > 0 && cleaned.length - dot <= 16 ? cleaned.slice(dot) : '';
  return cleaned.slice(0, 255 - ext.length) + ext;
}
