import { Router } from 'express';
import { param } from 'express-validator';

import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { openFile } from '../services/files-service';

export const filesRouter = Router();

// The bucket is private; this is the only way to read a file, and it checks job access.
filesRouter.get(
  '/:id',
  requireRole('technician', 'reviewer', 'manager', 'admin'),
  validate(param('id', 'Must be a file id').isInt({ min: 1 }).toInt()),
  async (req, res) => {
    const { file, stream } = await openFile(req.user!, Number(req.params.id));
    res.setHeader('Content-Type', file.contentType);
    res.setHeader('Content-Length', String(file.sizeBytes));
    res.setHeader('Cache-Control', 'private, max-age=300');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    const inline = file.contentType.startsWith('image/') || file.contentType === 'application/pdf';
    res.setHeader('Content-Disposition', `${inline ? 'inline' : 'attachment'}; filename="${file.originalName.replace(/[^\w.\- ]/g, '_')}"`);
    stream.pipe(res);
  },
);
