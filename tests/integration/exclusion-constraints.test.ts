import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDb, type TestDb } from '../setup/test-db';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService, insertTestBooking, type BookingInput } from '../factories/booking';

let t: TestDb;
let salon: SalonFixture;
let ana: UserFixture;
let lee: UserFixture;
let client: UserFixture;
let serviceId: string;

beforeAll(async () => {
  t = await createTestDb();
  salon = await insertSalon(t.db, { chairs: 3, basins: 2 });
  ana = await insertUser(t.db, salon.salonId, 'stylist');
  lee = await insertUser(t.db, salon.salonId, 'stylist');
  client = await insertUser(t.db, salon.salonId, 'client');
  serviceId = await insertService(t.db, salon.salonId);
});
afterAll(() => t.drop());

const base = (): Omit<BookingInput, 'steps' | 'chairId' | 'stylistId'> => ({ salonId: salon.salonId, clientId: client.clientId!, serviceId });

/** Runs in its own transaction so a refused insert leaves nothing behind. */
async function book(input: Omit<BookingInput, 'salonId' | 'clientId' | 'serviceId'>) {
  return t.db.transaction().execute((trx) => insertTestBooking(trx, { ...base(), ...input }));
}

const expectRefused = async (p: Promise<unknown>, constraint: string) => {
  await expect(p).rejects.toMatchObject({ code: '23P01', constraint });
};

describe('the database refuses double booking (exclusion constraints)', () => {
  it('refuses a second client in the same chair at an overlapping time', async () => {
    await book({ stylistId: ana.staffId!, chairId: salon.chairs[0]!, steps: [['developing', '2027-03-03T17:00:00Z', '2027-03-03T18:00:00Z']] });
    await expectRefused(
      book({ stylistId: lee.staffId!, chairId: salon.chairs[0]!, steps: [['hands_on', '2027-03-03T17:59:00Z', '2027-03-03T18:30:00Z']] }),
      'sittings_no_chair_overlap',
    );
  });

  it('allows back-to-back use of a chair (ranges are half-open)', async () => {
    const id = await book({ stylistId: lee.staffId!, chairId: salon.chairs[0]!, steps: [['hands_on', '2027-03-03T18:00:00Z', '2027-03-03T18:30:00Z']] });
    expect(id).toMatch(/[0-9a-f-]{36}/);
  });

  it('refuses two basin steps on one basin at once', async () => {
    await book({ stylistId: ana.staffId!, chairId: salon.chairs[1]!, steps: [['basin', '2027-03-04T17:00:00Z', '2027-03-04T17:15:00Z', salon.basins[0]]] });
    await expectRefused(
      book({ stylistId: lee.staffId!, chairId: salon.chairs[2]!, steps: [['basin', '2027-03-04T17:10:00Z', '2027-03-04T17:20:00Z', salon.basins[0]]] }),
      'steps_no_basin_overlap',
    );
  });

  it("refuses overlapping hands_on/basin work of one stylist, but lets a developing step overlap the stylist's other work", async () => {
    await book({
      stylistId: ana.staffId!,
      chairId: salon.chairs[1]!,
      steps: [
        ['hands_on', '2027-03-05T17:00:00Z', '2027-03-05T17:30:00Z'],
        ['developing', '2027-03-05T17:30:00Z', '2027-03-05T18:10:00Z'],
      ],
    });
    await expectRefused(
      book({ stylistId: ana.staffId!, chairId: salon.chairs[2]!, steps: [['basin', '2027-03-05T17:20:00Z', '2027-03-05T17:35:00Z', salon.basins[1]]] }),
      'steps_no_hands_overlap',
    );
    // The hands-free window: Ana works on a second client while the first one's colour develops.
    const fit = await book({ stylistId: ana.staffId!, chairId: salon.chairs[2]!, steps: [['hands_on', '2027-03-05T17:35:00Z', '2027-03-05T18:00:00Z']] });
    expect(fit).toBeDefined();
  });

  it('of two concurrent overlapping bookings, exactly one succeeds', async () => {
    const attempt = () => book({ stylistId: lee.staffId!, chairId: salon.chairs[1]!, steps: [['hands_on', '2027-03-06T17:00:00Z', '2027-03-06T17:45:00Z']] });
    const results = await Promise.allSettled([attempt(), attempt()]);
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    expect(results.find((r) => r.status === 'rejected')).toMatchObject({ reason: { code: '23P01' } });
  });

  it('a cancelled booking frees its chair', async () => {
    const id = await book({ stylistId: lee.staffId!, chairId: salon.chairs[2]!, steps: [['hands_on', '2027-03-07T17:00:00Z', '2027-03-07T17:45:00Z']] });
    await t.db.updateTable('sittings').set({ live: false }).where('booking_id', '=', id).execute();
    await t.db
      .updateTable('booking_steps')
      .set({ live: false })
      .where('sitting_id', 'in', t.db.selectFrom('sittings').select('id').where('booking_id', '=', id))
      .execute();
    const again = await book({ stylistId: lee.staffId!, chairId: salon.chairs[2]!, steps: [['hands_on', '2027-03-07T17:00:00Z', '2027-03-07T17:45:00Z']] });
    expect(again).not.toBe(id);
  });
});
