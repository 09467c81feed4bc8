import type { Upload, UploadTarget } from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { seesPrices } from '../../http/money-access';
import { processImage, type ProcessedImage } from '../../lib/images';
import type { Logger } from '../../lib/logger';
import { newStorageKey, type Storage } from '../../lib/storage';
import type { UploadRow, UploadsRepo } from './uploads.repo';

interface Deps {
  repo: UploadsRepo;
  storage: Storage;
  logger: Logger;
  now: () => Date;
}

export interface IncomingFile {
  originalname: string;
  buffer: Buffer;
}

export const toUpload = (u: UploadRow): Upload => ({
  id: u.id,
  originalName: u.originalName,
  sourceType: u.sourceType,
  width: u.width,
  height: u.height,
  byteSize: u.byteSize,
  surveyComponentId: u.surveyComponentId,
  jobId: u.jobId,
  taskId: u.taskId,
  isSharedWithClient: u.isSharedWithClient,
  url: `/api/uploads/${u.id}`,
  thumbUrl: `/api/uploads/${u.id}?size=thumb`,
  createdAt: u.createdAt.toISOString(),
});

/**
 * A file name is only ever shown, never used as a path; one that tries to climb folders or hide
 * control characters is refused outright, so the upload fails clearly instead of being renamed.
 */
function checkName(name: string, field: string) {
  const isBad = name.length === 0 || name.length > 255 || /[/\\]/.test(name) || name.includes('..') || /[\u0000-\u001f\u007f]/.test(name);
  if (isBad) {
    const message = `The file name "${name.slice(0, 60)}" is not allowed: use a plain name without folders.`;
    throw new AppError('validation_failed', 400, message, { [field]: [message] });
  }
}

/**
 * Photos: every file is checked and converted before anything is stored; files are written
 * under random keys and recorded in one transaction, and a failure removes what was written.
 */
export function createUploadsService({ repo, storage, logger, now }: Deps) {
  async function removeFiles(keys: string[]) {
    for (const key of keys) await storage.delete(key).catch((err: unknown) => logger.error({ err, key }, 'could not remove a stored photo'));
  }

  return {
    async upload(auth: AuthContext, target: UploadTarget, files: IncomingFile[]): Promise<Upload[]> {
      if (files.length === 0) throw new AppError('validation_failed', 400, 'Attach at least one photo', { files: ['Attach at least one photo'] });
      if (target.isSharedWithClient && !seesPrices(auth.role)) throw new AppError('forbidden', 403, 'Only the owner or foreman chooses the photos the client sees');
      if (target.isSharedWithClient && !target.surveyComponentId) throw new AppError('validation_failed', 400, 'Only survey photos are shown to the client', { isSharedWithClient: ['Only survey photos are shown to the client'] });
      files.forEach((f, i) => checkName(f.originalname, `files.${i}`));
      if (!(await repo.targetExists(auth.workshopId, target))) throw notFound(target.surveyComponentId ? 'That survey component' : target.jobId ? 'That job' : 'That task');
      const processed: Array<{ file: IncomingFile; image: ProcessedImage }> = [];
      for (const [i, file] of files.entries()) processed.push({ file, image: await processImage(file.buffer, `files.${i}`) });

      const written: string[] = [];
      try {
        const rows = [];
        for (const { file, image } of processed) {
          const { key, thumbKey } = newStorageKey(auth.workshopId);
          await storage.put(key, image.web, 'image/jpeg');
          written.push(key);
          await storage.put(thumbKey, image.thumb, 'image/jpeg');
          written.push(thumbKey);
          rows.push({
            workshopId: auth.workshopId,
            storageKey: key,
            thumbKey,
            sourceType: image.sourceType,
            originalName: file.originalname,
            width: image.width,
            height: image.height,
            byteSize: image.web.length,
            surveyComponentId: target.surveyComponentId ?? null,
            jobId: target.jobId ?? null,
            taskId: target.taskId ?? null,
            isSharedWithClient: target.isSharedWithClient ?? false,
            uploadedBy: auth.userId,
            createdAt: now(),
          });
        }
        return (await repo.insertAll(rows)).map(toUpload);
      } catch (err) {
        await removeFiles(written);
        throw err;
      }
    },

    /** The stored JPEG of a photo of this workshop; another workshop's id answers 404. */
    async read(workshopId: string, id: string, size: 'web' | 'thumb') {
      const row = await repo.find(workshopId, id);
      if (!row) throw notFound('That photo');
      const body = await storage.get(size === 'thumb' ? row.thumbKey : row.storageKey);
      if (!body) throw notFound('That photo’s file');
      return body;
    },

    async setShared(auth: AuthContext, id: string, isSharedWithClient: boolean): Promise<Upload> {
      const row = await repo.find(auth.workshopId, id);
      if (!row) throw notFound('That photo');
      if (isSharedWithClient && !row.surveyComponentId) throw new AppError('validation_failed', 400, 'Only survey photos are shown to the client', { isSharedWithClient: ['Only survey photos are shown to the client'] });
      return toUpload((await repo.setShared(auth.workshopId, id, isSharedWithClient))!);
    },

    async remove(auth: AuthContext, id: string) {
      const row = await repo.remove(auth.workshopId, id);
      if (!row) throw notFound('That photo');
      await removeFiles([row.storageKey, row.thumbKey]);
    },
  };
}

export type UploadsService = ReturnType<typeof createUploadsService>;
