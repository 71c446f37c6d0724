import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { remove, upload, type UploadFile } from '../setup/upload-agent';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService, insertTestBooking } from '../factories/booking';
import { GPS_POINTER_LE, jpegWithGps, makeImage, pngBomb } from '../factories/image';

let t: TestApp;
let client: UserFixture, otherClient: UserFixture, stylist: UserFixture, otherSalonStylist: UserFixture;
let bookingId: string;
let salonId: string;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  const salon = await insertSalon(db);
  salonId = salon.salonId;
  [client, otherClient, stylist] = await Promise.all([
    insertUser(db, salon.salonId, 'client'),
    insertUser(db, salon.salonId, 'client'),
    insertUser(db, salon.salonId, 'stylist'),
  ]);
  otherSalonStylist = await insertUser(db, (await insertSalon(db)).salonId, 'stylist');
  bookingId = await insertTestBooking(db, {
    salonId: salon.salonId,
    clientId: client.clientId!,
    stylistId: stylist.staffId!,
    chairId: salon.chairs[0]!,
    serviceId: await insertService(db, salon.salonId),
    steps: [['hands_on', '2027-03-02T17:00:00Z', '2027-03-02T17:30:00Z']],
  });
});
afterAll(() => t.close());

const as = async (u: UserFixture) => (await signedInAgent(t.app, u.email, u.password)).agent;
const rowsOf = (clientId: string) => t.testDb.db.selectFrom('client_photos').selectAll().where('client_id', '=', clientId).execute();
const storedFiles = async () => (await readdir(t.uploadsDir, { recursive: true })).filter((f) => /\.(jpg|png|webp)$/.test(f)).sort();
const jpeg = async (name: string): Promise<UploadFile> => ({ name, bytes: await makeImage('jpeg') });
const SCRIPT = Buffer.from('#!/bin/sh\necho pwned\n');

describe('POST /api/me/photos: what is accepted', () => {
  it('when a PNG is named .gif and sent as image/gif, stores it as a PNG', async () => {
    const res = await upload(await as(client), '/api/me/photos', [{ name: 'holiday.gif', bytes: await makeImage('png'), contentType: 'image/gif' }]);
    expect(res.status).toBe(201);
    const [row] = (await rowsOf(client.clientId!)).filter((r) => r.id === res.body.photos[0].id);
    expect(row?.mime).toBe('image/png');
    expect(row?.storage_key).toMatch(/\.png$/);
    expect(row?.storage_key).not.toContain('holiday');
  });

  it('when a JPEG carries EXIF GPS, stores it upright with no EXIF at all', async () => {
    const original = await jpegWithGps();
    expect((await sharp(original).metadata()).exif?.includes(GPS_POINTER_LE)).toBe(true); // the input really has GPS
    const res = await upload(await as(client), '/api/me/photos', [{ name: 'IMG_0001.jpg', bytes: original }]);
    expect(res.status).toBe(201);
    const row = (await rowsOf(client.clientId!)).find((r) => r.id === res.body.photos[0].id)!;
    const onDisk = await readFile(path.join(t.uploadsDir, row.storage_key));
    const meta = await sharp(onDisk).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
    expect(onDisk.includes('dwell-exif-marker')).toBe(false);
    // Orientation 6 turned the 60×30 picture upright: it is now 30 wide and 60 high.
    expect([meta.width, meta.height]).toEqual([30, 60]);
  });

  it('when the file name tries path traversal, stores under a random key inside the uploads folder', async () => {
    const res = await upload(await as(client), '/api/me/photos', [await jpeg('../../../etc/passwd.jpg')]);
    expect(res.status).toBe(201);
    const row = (await rowsOf(client.clientId!)).find((r) => r.id === res.body.photos[0].id)!;
    expect(row.storage_key).toMatch(/^[0-9a-f-]{36}\/[0-9a-f-]{36}\.jpg$/);
    expect(await storedFiles()).toContain(row.storage_key);
  });
});

describe('POST /api/me/photos: what is refused', () => {
  const refused = async (file: UploadFile, status: number, text: RegExp) => {
    const before = await storedFiles();
    const res = await upload(await as(otherClient), '/api/me/photos', [file]);
    expect(res.status).toBe(status);
    expect(res.body.error.message).toMatch(text);
    expect(await rowsOf(otherClient.clientId!)).toHaveLength(0);
    expect(await storedFiles()).toEqual(before);
  };
  it('when a shell script is renamed .jpg, responds 400 naming the file', () =>
    refused({ name: 'cute-cut.jpg', bytes: SCRIPT }, 400, /“cute-cut\.jpg” is not a JPEG, PNG/));
  it('when the file is empty, responds 400', () => refused({ name: 'empty.png', bytes: Buffer.alloc(0) }, 400, /“empty\.png” is empty/));
  it('when a file is over 10 MB, responds 413 naming it', async () => {
    const big = Buffer.concat([await makeImage('jpeg'), Buffer.alloc(10 * 1024 * 1024)]);
    await refused({ name: 'huge.jpg', bytes: big }, 413, /“huge\.jpg” is larger than 10 MB/);
  });
  it('when the header declares huge dimensions (a decompression bomb), responds 400', async () =>
    refused({ name: 'bomb.png', bytes: await pngBomb() }, 400, /“bomb\.png” is too large in pixels/));

  it('when a JPEG carries an HTML page with a script after its image data (a polyglot), stores only the re-encoded image', async () => {
    const payload = '<html><body><script>alert(document.cookie)</script></body></html>';
    const polyglot = Buffer.concat([await makeImage('jpeg'), Buffer.from(payload)]);
    const before = await storedFiles();
    const someone = await insertUser(t.testDb.db, salonId, 'client');
    const res = await upload(await as(someone), '/api/me/photos', [{ name: 'look.jpg', bytes: polyglot }], { kind: 'wanted' });
    expect(res.status).toBe(201);
    const added = (await storedFiles()).filter((f) => !before.includes(f));
    expect(added).toHaveLength(1);
    const stored = await readFile(path.join(t.uploadsDir, added[0]!));
    expect(stored.includes(Buffer.from('<script'))).toBe(false);
    expect((await sharp(stored).metadata()).format).toBe('jpeg');
    const served = await (await as(someone)).get(`/api/photos/${res.body.photos[0].id}`).buffer(true);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect((served.body as Buffer).includes(Buffer.from('<script'))).toBe(false);
  });

  it('when a hundred photos come in one request, refuses them all with the limit named and keeps none', async () => {
    const before = await storedFiles();
    const one = await makeImage('jpeg');
    const hundred = Array.from({ length: 100 }, (_, i) => ({ name: `p${i}.jpg`, bytes: one }));
    const res = await upload(await as(await insertUser(t.testDb.db, salonId, 'client')), '/api/me/photos', hundred, { kind: 'wanted' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/at most 10/);
    expect(await storedFiles()).toEqual(before);
  });

  it('when one file of a batch is bad, keeps none of the batch and names each refused file', async () => {
    const before = await storedFiles();
    const res = await upload(await as(otherClient), '/api/me/photos', [await jpeg('a.jpg'), { name: 'b.jpg', bytes: SCRIPT }, await jpeg('c.jpg')]);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ 'photos.1': expect.stringMatching(/^“b\.jpg” is not/) });
    expect(await rowsOf(otherClient.clientId!)).toHaveLength(0);
    expect(await storedFiles()).toEqual(before);
  });
});

describe('photo limits', () => {
  it('when a booking already has 10 photos, refuses the 11th and removes its stored file', async () => {
    const c = await as(client);
    const ten = await Promise.all([...Array(10).keys()].map((i) => jpeg(`p${i}.jpg`)));
    expect((await upload(c, '/api/me/photos', ten, { kind: 'hair_now', bookingId })).status).toBe(201);
    const before = await storedFiles();
    const res = await upload(c, '/api/me/photos', [await jpeg('eleven.jpg')], { kind: 'wanted', bookingId });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/at most 10 photos/);
    expect((await rowsOf(client.clientId!)).filter((r) => r.booking_id === bookingId)).toHaveLength(10);
    expect(await storedFiles()).toEqual(before);
  });

  it('when the booking is someone else’s, responds 404', async () => {
    const res = await upload(await as(otherClient), '/api/me/photos', [await jpeg('x.jpg')], { kind: 'hair_now', bookingId });
    expect(res.status).toBe(404);
  });
});

describe('POST /api/clients/:id/photos', () => {
  it('when the salon’s stylist adds a photo, stores it for the client; another salon’s stylist gets 404', async () => {
    const path = `/api/clients/${client.clientId}/photos`;
    const before = (await rowsOf(client.clientId!)).length;
    expect((await upload(await as(otherSalonStylist), path, [await jpeg('x.jpg')])).status).toBe(404);
    const res = await upload(await as(stylist), path, [await jpeg('at-the-chair.jpg')], { kind: 'hair_now' });
    expect(res.status).toBe(201);
    expect(await rowsOf(client.clientId!)).toHaveLength(before + 1);
  });
});

describe('GET and DELETE /api/photos/:id', () => {
  let photoId: string;
  beforeAll(async () => {
    photoId = (await upload(await as(client), '/api/me/photos', [await jpeg('mine.jpg')], { kind: 'wanted' })).body.photos[0].id;
  });

  it('when the owning client or the salon’s stylist asks, serves the image privately with nosniff', async () => {
    for (const u of [client, stylist]) {
      const res = await (await as(u)).get(`/api/photos/${photoId}`).buffer(true);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('image/jpeg');
      expect(res.headers['cache-control']).toMatch(/^private/);
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect((await sharp(res.body as Buffer).metadata()).format).toBe('jpeg');
    }
    const list = await (await as(stylist)).get(`/api/clients/${client.clientId}/photos`);
    expect(list.body.photos.map((p: { id: string }) => p.id)).toContain(photoId);
  });

  it('when another client or another salon’s stylist asks, responds 404 to reading, listing and deleting', async () => {
    for (const u of [otherClient, otherSalonStylist]) {
      const a = await as(u);
      expect((await a.get(`/api/photos/${photoId}`)).status).toBe(404);
      expect((await a.get(`/api/clients/${client.clientId}/photos`)).status).toBe(404);
      expect((await remove(a, `/api/photos/${photoId}`)).status).toBe(404);
    }
    expect((await rowsOf(client.clientId!)).some((r) => r.id === photoId)).toBe(true);
  });

  it('when the owning client deletes it, the row and the file are gone', async () => {
    const key = (await rowsOf(client.clientId!)).find((r) => r.id === photoId)!.storage_key;
    expect((await remove(await as(client), `/api/photos/${photoId}`)).status).toBe(204);
    expect((await rowsOf(client.clientId!)).some((r) => r.id === photoId)).toBe(false);
    expect(await storedFiles()).not.toContain(key);
  });
});
