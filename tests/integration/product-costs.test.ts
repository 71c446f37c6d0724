import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService } from '../factories/booking';
import { insertBooking } from '@server/features/bookings/bookings.repository';

let t: TestApp;
let salon: SalonFixture;
let stylist: UserFixture;
let bookingId: string;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
const HOUR = 3_600_000;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  stylist = await insertUser(db, salon.salonId, 'stylist');
  const client = await insertUser(db, salon.salonId, 'client');
  const owner = await insertUser(db, salon.salonId, 'owner');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const start = Math.floor(Date.now() / HOUR) * HOUR - 2 * HOUR;
  bookingId = await insertBooking(db, {
    salonId: salon.salonId,
    clientId: client.clientId!,
    serviceId: await insertService(db, salon.salonId),
    stylistId: stylist.staffId!,
    status: 'finished',
    stepPlan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply', product: 'none', minutes: 60 }] }] },
    priceCents: 0,
    depositCents: 0,
    createdBy: null,
    sittings: [
      { chairId: salon.chairs[0]!, steps: [{ kind: 'hands_on', label: 'Apply', start: new Date(start), end: new Date(start + HOUR), basinId: null }] },
    ],
  });
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const bowl = (bowlNo: number, productType: string, grams: number[]) => ({
  sittingSeq: 1,
  bowlNo,
  productType,
  shadeNotes: '',
  developerPercent: 6,
  ratio: '1:2',
  grams: grams.map((g, i) => ({ kind: i === 0 ? productType : 'developer', part: '', grams: g })),
  appliedTo: '',
  plannedMinutes: null,
  actualMinutes: null,
  heat: false,
  resultNotes: '',
});
const sitting = async () => (await stylist$.get(`/api/bookings/${bookingId}/mix-logs`)).body.sittings[0];

describe('product cost per sitting', () => {
  it('is unknown until the owner sets a cost per gram for every product and developer used, then grams × cost', async () => {
    expect((await stylist$.write('post', `/api/bookings/${bookingId}/mix-logs`, bowl(1, 'lightener', [30, 60]))).status).toBe(201);
    expect((await stylist$.write('post', `/api/bookings/${bookingId}/mix-logs`, bowl(2, 'toner', [20, 30]))).status).toBe(201);
    expect((await sitting()).estimatedCostCents).toBeNull();

    const saved = await owner$.write('put', '/api/owner/quote-prices', { correctionCentsPerHour: 11000, productCentsPerGram: { lightener: 4, toner: 7.5 } });
    expect(saved.status).toBe(200);
    // Developer (60 + 30 = 90 g) has no cost yet, so the estimate stays unknown rather than too low.
    expect(await sitting()).toMatchObject({ totalGrams: 140, estimatedCostCents: null });

    expect(
      (await owner$.write('put', '/api/owner/quote-prices', { correctionCentsPerHour: 11000, productCentsPerGram: { lightener: 4, toner: 7.5, developer: 1 } }))
        .status,
    ).toBe(200);
    // Hand arithmetic: lightener 30 g × 4 ¢ = 120 ¢; toner 20 g × 7.5 ¢ = 150 ¢; developer 90 g × 1 ¢ = 90 ¢;
    // 30 + 20 + 90 = 140 g; 120 + 150 + 90 = 360 ¢.
    expect(await sitting()).toMatchObject({ totalGrams: 140, estimatedCostCents: 360 });
  });

  it('only the owner sets prices; bad values name the field and change nothing', async () => {
    expect((await desk$.write('put', '/api/owner/quote-prices', { correctionCentsPerHour: 1, productCentsPerGram: {} })).status).toBe(403);
    const bad = await owner$.write('put', '/api/owner/quote-prices', { correctionCentsPerHour: -5, productCentsPerGram: { lightener: -1, glitter: 3 } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['correctionCentsPerHour', 'productCentsPerGram.lightener']));
    expect((await owner$.get('/api/owner/quote-prices')).body).toEqual({
      correctionCentsPerHour: 11000,
      productCentsPerGram: { lightener: 4, toner: 7.5, developer: 1 },
    });
  });
});
