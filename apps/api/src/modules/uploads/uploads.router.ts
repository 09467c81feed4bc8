import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { IdParams, UpdateUploadInput, UploadSizeQuery, UploadTarget } from '@keybed/shared';
import type { Config } from '../../config/env';
import { authOf, routesOn } from '../../http/context';
import { AppError } from '../../http/errors';
import { parse } from '../../http/parse';
import { BOARD_WRITERS } from '../../http/roles';
import type { UploadsService } from './uploads.service';

/** Multipart in memory (nothing touches the disk before the content is checked), within limits. */
function receiveFiles(limits: Config['uploads']): RequestHandler {
  const mb = Math.round(limits.maxBytes / (1024 * 1024));
  const accept = multer({
    storage: multer.memoryStorage(),
    // Keep the name exactly as sent so one that tries to climb folders is refused, not quietly trimmed.
    preservePath: true,
    limits: { fileSize: limits.maxBytes, files: limits.maxFiles, fields: 10, fieldSize: 200, parts: limits.maxFiles + 10 },
  }).array('files', limits.maxFiles);
  const messages: Record<string, [number, 'payload_too_large' | 'validation_failed', string]> = {
    LIMIT_FILE_SIZE: [413, 'payload_too_large', `Each photo can be at most ${mb} MB`],
    LIMIT_FILE_COUNT: [413, 'payload_too_large', `At most ${limits.maxFiles} photos at a time`],
    LIMIT_UNEXPECTED_FILE: [400, 'validation_failed', `Send the photos as "files", at most ${limits.maxFiles} at a time`],
  };
  return (req, res, next) => {
    accept(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        const [status, code, message] = messages[err.code] ?? [400, 'validation_failed', 'The upload could not be read'];
        return next(new AppError(code, status, message, { files: [message] }));
      }
      next(new AppError('validation_failed', 400, 'The upload could not be read'));
    });
  };
}

export function uploadsRouter(service: UploadsService, limits: Config['uploads']) {
  const router = Router();
  const r = routesOn(router);

  r.post('/uploads', 'member', receiveFiles(limits), async (req, res) => {
    const files = (req.files as Express.Multer.File[] | undefined) ?? [];
    const uploads = await service.upload(authOf(req), parse(UploadTarget, req.body ?? {}), files);
    res.status(201).json({ uploads });
  });

  r.get('/uploads/:id', 'member', async (req, res) => {
    const { id } = parse(IdParams, req.params);
    const body = await service.read(authOf(req).workshopId, id, parse(UploadSizeQuery, req.query).size);
    res.setHeader('Cache-Control', 'private, max-age=3600');
    res.type('image/jpeg').send(body);
  });

  r.patch('/uploads/:id', BOARD_WRITERS, async (req, res) => {
    const { id } = parse(IdParams, req.params);
    res.json(await service.setShared(authOf(req), id, parse(UpdateUploadInput, req.body).isSharedWithClient));
  });

  r.delete('/uploads/:id', 'member', async (req, res) => {
    await service.remove(authOf(req), parse(IdParams, req.params).id);
    res.status(204).end();
  });

  return router;
}
