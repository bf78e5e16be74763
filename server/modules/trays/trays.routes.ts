import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import {
  createTraySchema,
  listTraysQuerySchema,
  scaleTraySchema,
  trayIdParams,
  updateTraySchema,
} from '@shared/schemas/trays.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { NotFound, ValidationError } from '../../http/errors.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import * as trays from './trays.service.js';
import { PHOTO_MAX_BYTES, PhotoTooLarge, saveTrayPhoto, trayPhotoFile } from './tray-photo.service.js';

/** Base trays: coach writes; assistant reads; a client reads only the trays in their own plan. */
export function trayRoutes(opts: { filesDir: string }) {
  const r = Router();
  const readers = allow('coach', 'assistant', 'client');

  r.get(
    '/trays',
    allow('coach', 'assistant', 'client'),
    validated({ query: listTraysQuerySchema }, ({ query }, req) => trays.listTrays(emOf(req), actorOf(req), query)),
  );

  r.post(
    '/trays',
    allow('coach'),
    validated({ body: createTraySchema }, async ({ body }, req, res) => {
      const dto = await trays.createTray(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );

  r.get(
    '/trays/:id',
    readers,
    validated({ params: trayIdParams }, ({ params }, req) => trays.getTray(emOf(req), actorOf(req), params.id)),
  );

  r.put(
    '/trays/:id',
    allow('coach'),
    validated({ params: trayIdParams, body: updateTraySchema }, ({ params, body }, req) =>
      trays.updateTray(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.delete(
    '/trays/:id',
    allow('coach'),
    validated({ params: trayIdParams }, async ({ params }, req) => {
      const out = await trays.deleteTray(emOf(req), actorOf(req), params.id, opts.filesDir);
      // 204 when deleted; 200 with { archived: true } when a plan uses it and it was archived instead.
      return out.archived ? out : undefined;
    }),
  );

  r.get(
    '/trays/:id/portion-card',
    allow('coach', 'assistant', 'client'),
    validated({ params: trayIdParams }, ({ params }, req) => trays.portionCard(emOf(req), actorOf(req), params.id)),
  );

  r.post(
    '/trays/:id/scale',
    allow('coach', 'assistant', 'client'),
    validated({ params: trayIdParams, body: scaleTraySchema }, ({ params, body }, req) =>
      trays.scaleTray(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.post(
    '/trays/:id/duplicate',
    allow('coach'),
    validated({ params: trayIdParams }, async ({ params }, req, res) => {
      const dto = await trays.duplicateTray(emOf(req), actorOf(req), params.id);
      res.status(201);
      return dto;
    }),
  );

  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 5 } });
  const onePhoto = (req: Request, res: Response, next: NextFunction) =>
    upload.single('photo')(req, res, (err?: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return next(new PhotoTooLarge());
      if (err instanceof multer.MulterError) return next(ValidationError.field('photo', `Upload one photo in the field "photo" (${err.code})`));
      next(err);
    });

  r.post(
    '/trays/:id/photo',
    allow('coach'),
    validated({ params: trayIdParams }, async ({ params }, req, res) => {
      const em = emOf(req);
      const actor = actorOf(req);
      await trays.findTray(em, actor, params.id);
      await new Promise<void>((resolve, reject) => onePhoto(req, res, (err?: unknown) => (err ? reject(err) : resolve())));
      if (!req.file) throw ValidationError.field('photo', 'Attach a photo (multipart field "photo")');
      await saveTrayPhoto(em, actor, params.id, req.file.buffer, opts.filesDir);
      return (await trays.getTray(em, actor, params.id)).photo;
    }),
  );

  for (const which of ['photo', 'thumbnail'] as const) {
    r.get(
      `/trays/:id/${which}`,
      allow('coach', 'assistant', 'client'),
      validated({ params: trayIdParams }, async ({ params }, req, res) => {
        const em = emOf(req);
        const actor = actorOf(req);
        await trays.findTray(em, actor, params.id);
        const file = await trayPhotoFile(em, actor, params.id, which, opts.filesDir);
        // Cache-Control as every API answer (server/app.ts): asked again each time it shows, a 304 when unchanged;
        // no copy at all kept for a session not kept signed in (a shared computer).
        res.setHeader('x-content-type-options', 'nosniff');
        res.type(file.contentType);
        await new Promise<void>((resolve, reject) =>
          // `dotfiles: 'allow'`: the path is ours, resolved inside FILES_DIR, whose default (.data/files) is a
          // dot-folder that `send` would otherwise answer as not found.
          res.sendFile(file.path, { etag: false, dotfiles: 'allow', headers: { etag: file.etag } }, (err) => {
            if (!err) return resolve();
            const missing = (err as NodeJS.ErrnoException).code === 'ENOENT' || (err as { status?: number }).status === 404;
            reject(missing ? new NotFound('Photo') : err);
          }),
        );
      }),
    );
  }

  return r;
}
