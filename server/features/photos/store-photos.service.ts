import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { PHOTO_LIMITS, type PhotoKind } from '@shared/schemas/photo.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { safeFileName } from '@server/lib/safe-file-name';
import { newKey, type Storage } from '@server/storage/storage';
import { cleanImage, ImageRefused, type CleanImage } from './photo-image';
import { findClientBooking, insertPhotos, lockClientPhotos } from './photos.repository';

export interface PhotoBatch {
  salonId: string;
  clientId: string;
  bookingId: string | null;
  kind: PhotoKind;
  files: { originalname: string; buffer: Buffer }[];
}

/**
 * All of a batch or none of it: every file is checked and re-encoded first (each refusal named), then
 * the bytes are stored under fresh random keys, then the rows are written in one transaction that also
 * re-checks the limits; if anything fails after storing, the stored files are removed again.
 */
export async function storePhotos(db: Kysely<Database>, storage: Storage, batch: PhotoBatch) {
  if (batch.bookingId && !(await findClientBooking(db, batch.salonId, batch.clientId, batch.bookingId))) throw notFound('That booking');
  const images = await cleanAll(batch.files);
  const keys: string[] = [];
  try {
    for (const image of images) {
      const key = newKey(batch.salonId, image.format);
      await storage.put(key, image.bytes);
      keys.push(key);
    }
    return await db.transaction().execute(async (trx) => {
      await checkLimits(trx, batch);
      return insertPhotos(
        trx,
        images.map((image, i) => ({ ...batch, key: keys[i]!, mime: image.mime, bytes: image.bytes.length, width: image.width, height: image.height })),
      );
    });
  } catch (error) {
    await Promise.allSettled(keys.map((key) => storage.delete(key)));
    throw error;
  }
}

/** One at a time, to bound memory; every refusal is collected so the client can show them all. */
async function cleanAll(files: PhotoBatch['files']): Promise<CleanImage[]> {
  const images: CleanImage[] = [];
  const refusals: Record<string, string> = {};
  for (const [i, file] of files.entries()) {
    try {
      images.push(await cleanImage(file.buffer));
    } catch (error) {
      if (!(error instanceof ImageRefused)) throw error;
      refusals[`photos.${i}`] = `“${safeFileName(file.originalname)}” ${error.message}.`;
    }
  }
  const messages = Object.values(refusals);
  if (messages.length > 0) {
    const summary = messages.length === 1 ? messages[0]! : `${messages.length} files were refused; nothing was saved.`;
    throw new AppError('VALIDATION_FAILED', 400, summary, refusals);
  }
  return images;
}

async function checkLimits(trx: Parameters<typeof lockClientPhotos>[0], batch: PhotoBatch) {
  const counts = await lockClientPhotos(trx, batch.clientId, batch.bookingId);
  const adding = batch.files.length;
  if (batch.bookingId && counts.forBooking + adding > PHOTO_LIMITS.perBooking) {
    throw new AppError('VALIDATION_FAILED', 400, `A booking can have at most ${PHOTO_LIMITS.perBooking} photos; it has ${counts.forBooking}.`, {
      photos: `At most ${PHOTO_LIMITS.perBooking - counts.forBooking} more for this booking`,
    });
  }
  if (counts.forClient + adding > PHOTO_LIMITS.perClient) {
    throw new AppError('VALIDATION_FAILED', 400, `At most ${PHOTO_LIMITS.perClient} photos can be kept; remove some first.`, {
      photos: `At most ${PHOTO_LIMITS.perClient - counts.forClient} more`,
    });
  }
}
