import type { Selectable } from 'kysely';
import type { Db } from '@server/db/database';
import type { Database } from '@server/db/schema';
import type { PhotoKind } from '@shared/schemas/photo.schemas';

const COLUMNS = ['id', 'salon_id', 'client_id', 'booking_id', 'kind', 'storage_key', 'mime', 'width', 'height', 'created_at'] as const;

/** One stored photo: its row, and the key of its bytes in storage. */
export interface Photo {
  id: string;
  salonId: string;
  clientId: string;
  bookingId: string | null;
  kind: PhotoKind;
  storageKey: string;
  mime: string;
  width: number;
  height: number;
  createdAt: Date;
}

type PhotoRow = Selectable<Database['client_photos']>;

const toPhoto = (r: Pick<PhotoRow, (typeof COLUMNS)[number]>): Photo => ({
  id: r.id,
  salonId: r.salon_id,
  clientId: r.client_id,
  bookingId: r.booking_id,
  kind: r.kind as PhotoKind,
  storageKey: r.storage_key,
  mime: r.mime,
  width: r.width,
  height: r.height,
  createdAt: r.created_at,
});

export async function listPhotos(db: Db, clientId: string): Promise<Photo[]> {
  const rows = await db.selectFrom('client_photos').select(COLUMNS).where('client_id', '=', clientId).orderBy('created_at').orderBy('id').execute();
  return rows.map(toPhoto);
}

export async function findPhoto(db: Db, id: string): Promise<Photo | undefined> {
  const row = await db.selectFrom('client_photos').select(COLUMNS).where('id', '=', id).executeTakeFirst();
  return row && toPhoto(row);
}

/** Whether this client record belongs to this user's account (a client sees only their own photos). */
export async function isOwnClientRecord(db: Db, clientId: string, userId: string): Promise<boolean> {
  return Boolean(await db.selectFrom('clients').select('id').where('id', '=', clientId).where('user_id', '=', userId).executeTakeFirst());
}

/** Locks the client's row so two uploads at once cannot both squeeze under the limits. */
export async function lockClientPhotos(db: Db, clientId: string, bookingId: string | null) {
  await db.selectFrom('clients').select('id').where('id', '=', clientId).forUpdate().executeTakeFirstOrThrow();
  const base = () => db.selectFrom('client_photos').where('client_id', '=', clientId);
  const count = (q: ReturnType<typeof base>) => q.select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow();
  const forClient = Number((await count(base())).n);
  const forBooking = bookingId ? Number((await count(base().where('booking_id', '=', bookingId))).n) : 0;
  return { forClient, forBooking };
}

/** The booking, if it is this client's in this salon. */
export function findClientBooking(db: Db, salonId: string, clientId: string, bookingId: string) {
  return db
    .selectFrom('bookings')
    .select('id')
    .where('id', '=', bookingId)
    .where('client_id', '=', clientId)
    .where('salon_id', '=', salonId)
    .executeTakeFirst();
}

export async function insertPhotos(
  db: Db,
  rows: {
    salonId: string;
    clientId: string;
    bookingId: string | null;
    kind: PhotoKind;
    key: string;
    mime: string;
    bytes: number;
    width: number;
    height: number;
  }[],
) {
  return db
    .insertInto('client_photos')
    .values(
      rows.map((r) => ({
        salon_id: r.salonId,
        client_id: r.clientId,
        booking_id: r.bookingId,
        kind: r.kind,
        storage_key: r.key,
        mime: r.mime,
        bytes: r.bytes,
        width: r.width,
        height: r.height,
      })),
    )
    .returning(COLUMNS)
    .execute()
    .then((inserted) => inserted.map(toPhoto));
}

export function deletePhoto(db: Db, id: string) {
  return db.deleteFrom('client_photos').where('id', '=', id).execute();
}
