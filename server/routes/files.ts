import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';

import { type Response, Router } from 'express';
import { param } from 'express-validator';

import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import type { StoredFile } from '../models';
import { openFile } from '../services/files-service';

// RFC 6266: an ASCII fallback name plus the UTF-8 name, so Küche–Süd.png downloads intact.
export function contentDisposition(kind: 'inline' | 'attachment', name: string) {
  const fallback = name.replace(/[^\w.\- ]/g, '_');
  return `${kind}; filename="${fallback}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export const filesRouter = Router();

// The bucket is private; this is the only way to read a file, and it checks job access.
filesRouter.get(
  '/:id',
  requireRole('technician', 'reviewer', 'manager', 'admin'),
  validate(param('id', 'Must be a file id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    const { file, stream } = await openFile(req.user!, Number(req.params.id));
    await sendStoredFile(res, file, stream);
  },
);

// The stored object with its type, size and name; images inline, a PDF (which can carry
// scripts) and anything else as a download.
export async function sendStoredFile(res: Response, file: StoredFile, stream: Readable) {
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('Content-Length', String(file.sizeBytes));
  res.setHeader('Cache-Control', 'private, max-age=300');
  res.setHeader('X-Content-Type-Options', 'nosniff');
  const inline = file.contentType.startsWith('image/');
  res.setHeader('Content-Disposition', contentDisposition(inline ? 'inline' : 'attachment', file.originalName));
  // pipeline ends the storage stream when the client goes away, and reports a broken one.
  await pipeline(stream, res).catch(() => {
    stream.destroy();
    res.destroy();
  });
}
