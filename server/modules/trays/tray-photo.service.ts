import { createHash, randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import sharp, { type Metadata } from 'sharp';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Actor } from '../../http/authz.js';
import { HttpError, NotFound } from '../../http/errors.js';
import { TrayPhoto, type ITrayPhoto } from './tray.entity.js';

/** Photos: jpeg, png or webp up to 5 MB, checked by their content (magic bytes and sharp's reading), never by name. */
export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const THUMB_WIDTH = 480;
export const THUMB_HEIGHT = 360;
/** The stored original is re-encoded (which drops EXIF, e.g. GPS) and at most this many pixels on its long side. */
export const PHOTO_MAX_SIDE = 2400;

type PhotoFormat = 'jpeg' | 'png' | 'webp';
const CONTENT_TYPES: Record<PhotoFormat, string> = { jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp' };

/** The format the first bytes announce (JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF" …. "WEBP"). */
export function sniffImage(buf: Buffer): PhotoFormat | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (buf.length >= 8 && png.every((b, i) => buf[i] === b)) return 'png';
  if (buf.length >= 12 && buf.toString('ascii', 0, 4) === 'RIFF' && buf.toString('ascii', 8, 12) === 'WEBP') return 'webp';
  return null;
}

export class UnsupportedPhoto extends HttpError {
  constructor(message = 'Upload a JPEG, PNG or WebP photo') {
    super(415, 'unsupported_media_type', message, { errors: { photo: [message] } });
  }
}

export class PhotoTooLarge extends HttpError {
  constructor() {
    super(413, 'too_large', 'The photo is larger than 5 MB', { errors: { photo: ['The photo is larger than 5 MB'] } });
  }
}

async function checkedFormat(buf: Buffer): Promise<PhotoFormat> {
  if (buf.length > PHOTO_MAX_BYTES) throw new PhotoTooLarge();
  const sniffed = sniffImage(buf);
  if (!sniffed) throw new UnsupportedPhoto();
  let meta: Metadata;
  try {
    meta = await sharp(buf).metadata();
  } catch {
    throw new UnsupportedPhoto('This file is not a readable image');
  }
  if (meta.format !== sniffed) throw new UnsupportedPhoto('The file content does not match an image format we accept');
  return sniffed;
}

function resolveIn(filesDir: string, rel: string): string {
  const root = path.resolve(filesDir);
  const full = path.resolve(root, rel);
  if (!full.startsWith(root + path.sep)) throw new NotFound('Photo');
  return full;
}

/** Saves (or replaces) a tray's photo and its thumbnail; the tray must already be checked to be the actor's. */
export async function saveTrayPhoto(
  em: EntityManager,
  actor: Actor,
  trayId: number,
  buf: Buffer,
  filesDir: string,
): Promise<ITrayPhoto> {
  const format = await checkedFormat(buf);
  const image = sharp(buf).rotate().resize(PHOTO_MAX_SIDE, PHOTO_MAX_SIDE, { fit: 'inside', withoutEnlargement: true });
  const original = await image.toFormat(format, format === 'jpeg' ? { quality: 86 } : {}).toBuffer({ resolveWithObject: true });
  const thumb = await sharp(buf).rotate().resize(THUMB_WIDTH, THUMB_HEIGHT, { fit: 'cover' }).webp({ quality: 78 }).toBuffer();

  const dir = path.join('trays', String(actor.workspaceId));
  const base = randomUUID();
  const filePath = path.join(dir, `${base}.${format === 'jpeg' ? 'jpg' : format}`);
  const thumbPath = path.join(dir, `${base}.thumb.webp`);
  await fs.mkdir(path.join(path.resolve(filesDir), dir), { recursive: true });
  await fs.writeFile(resolveIn(filesDir, filePath), original.data);
  await fs.writeFile(resolveIn(filesDir, thumbPath), thumb);

  const old = await em.findOne(TrayPhoto, { tray: trayId, workspace: actor.workspaceId });
  const fields = {
    contentType: CONTENT_TYPES[format],
    byteSize: original.data.length,
    width: original.info.width,
    height: original.info.height,
    filePath,
    thumbPath,
    sha256: createHash('sha256').update(original.data).digest('hex'),
  };
  let row: ITrayPhoto;
  let oldFiles: Pick<ITrayPhoto, 'filePath' | 'thumbPath'> | null = null;
  if (old) {
    oldFiles = { filePath: old.filePath, thumbPath: old.thumbPath };
    em.assign(old, fields);
    row = old;
  } else {
    row = em.create(TrayPhoto, { workspace: actor.workspaceId, tray: trayId, ...fields } as never) as ITrayPhoto;
  }
  await em.flush();
  if (oldFiles) await removePhotoFiles(oldFiles, filesDir);
  return row;
}

export async function trayPhotoFile(
  em: EntityManager,
  actor: Actor,
  trayId: number,
  which: 'photo' | 'thumbnail',
  filesDir: string,
): Promise<{ path: string; contentType: string; etag: string }> {
  const photo = await em.findOne(TrayPhoto, { tray: trayId, workspace: actor.workspaceId });
  if (!photo) throw new NotFound('Photo');
  return which === 'photo'
    ? { path: resolveIn(filesDir, photo.filePath), contentType: photo.contentType, etag: `"${photo.sha256}"` }
    : { path: resolveIn(filesDir, photo.thumbPath), contentType: 'image/webp', etag: `"${photo.sha256}-t"` };
}

/** Removes a photo's files; a file already gone is fine. */
export async function removePhotoFiles(p: Pick<ITrayPhoto, 'filePath' | 'thumbPath'>, filesDir: string): Promise<void> {
  await Promise.all(
    [p.filePath, p.thumbPath].map((rel) => fs.rm(resolveIn(filesDir, rel), { force: true }).catch(() => undefined)),
  );
}
