import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertBooking } from '@server/features/bookings/bookings.repository';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { middayZone } from '../factories/day-of-service';
import { ALL_DAY, bookStepsAt, openAroundTheClock, seedActuals } from '../factories/replan-day';

// An overrun re-planned in the running app: a tap answers the conflicts it makes, the desk reads them with their
// fixes, applies one through the usual services (locks, constraints, audit, messages), and tells a later client once.

type Agent = Awaited<ReturnType<typeof signedInAgent>>;

/** Apply 20 min, develop 20–40 min (booked at 40), rinse 10 min. */
const runningPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply', product: 'none', minutes: 20 },
        { kind: 'developing', label: 'Develops', product: 'none', minMinutes: 20, maxMinutes: 40 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
      ],
    },
  ],
};
const cutPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Cut', product: 'none', minutes: 30 }] }] };
const washCutPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'basin', label: 'Wash', product: 'none', minutes: 15 },
        { kind: 'hands_on', label: 'Cut', product: 'none', minutes: 30 },
      ],
    },
  ],
};

let t: TestApp;
let salon: SalonFixture;
let runningService: string;
let cutService: string;
let washCutService: string;
let desk$: Agent;
let deskUser: UserFixture;
let client$: Agent;
let otherSalonDesk$: Agent;

const db = () => t.testDb.db;
const fixPath = (bookingId: string) => `/api/bookings/${bookingId}/replan-fix`;
const tellPath = (bookingId: string) => `/api/bookings/${bookingId}/sittings/1/running-late`;

/** A stylist working all day, and their signed-in agent. */
async function stylist() {
  const user = await insertUser(db(), salon.salonId, 'stylist', { hours: ALL_DAY });
  return { user, staffId: user.staffId!, agent: await signedInAgent(t.app, user.email, user.password) };
}

/** A client who takes texts and e-mail. */
async function client(name: string) {
  const c = await insertUser(db(), salon.salonId, 'client');
  await db()
    .updateTable('clients')
    .set({ name, phone: `+1970555${String(Math.floor(Math.random() * 10_000)).padStart(4, '0')}`, message_channel: 'both' })
    .where('id', '=', c.clientId!)
    .execute();
  return c.clientId!;
}

async function unit(kind: 'chairs' | 'basins', name: string): Promise<string> {
  const row = await db().insertInto(kind).values({ salon_id: salon.salonId, name }).returning('id').executeTakeFirstOrThrow();
  return row.id;
}

let scene = 0;

/**
 * Stylist A's sitting under way since 30 minutes ago: "Apply" booked −30..−10 and still on (it overran), "Develops"
 * booked −10..30, "Rinse" 30..40 at basin X. Whatever the later booking, A's day now runs 10–15 minutes later than booked.
 */
async function overrun() {
  scene++;
  const a = await stylist();
  const chair = await unit('chairs', `Scene ${scene} chair`);
  const basin = await unit('basins', `Scene ${scene} basin`);
  const runningClient = await client(`Running Client ${scene}`);
  const running = await bookStepsAt(db(), {
    salonId: salon.salonId,
    serviceId: runningService,
    stylistId: a.staffId,
    clientId: runningClient,
    chairId: chair,
    plan: runningPlan,
    steps: [
      { kind: 'hands_on', label: 'Apply', from: -30, to: -10 },
      { kind: 'developing', label: 'Develops', from: -10, to: 30 },
      { kind: 'basin', label: 'Rinse', from: 30, to: 40, basinId: basin },
    ],
  });
  await seedActuals(db(), running, [[-30, null]]);
  return { a, chair, basin, running };
}

/** A's next client, a cut at 40..70 in a chair of its own. */
async function laterCut(a: { staffId: string }) {
  const chair = await unit('chairs', `Scene ${scene} later chair`);
  const clientId = await client(`Later Client ${scene}`);
  const id = await bookStepsAt(db(), {
    salonId: salon.salonId,
    serviceId: cutService,
    stylistId: a.staffId,
    clientId,
    chairId: chair,
    plan: cutPlan,
    steps: [{ kind: 'hands_on', label: 'Cut', from: 40, to: 70 }],
  });
  return { id, chair, clientId };
}

/** The step at seq 1 of the booking's sitting, finished now by its own stylist's tap. */
const finishApply = (agent: Agent, bookingId: string) => agent.write('post', `/api/bookings/${bookingId}/sittings/1/steps/1/finish`);

type Conflict = {
  kind: string;
  sitting: { bookingId: string; clientName: string };
  cause: { bookingId: string } | null;
  minutes: number;
  words: string;
  tellMinutes: number | null;
  fixes: Array<{ bookingId: string; fix: { kind: string; [k: string]: unknown }; words: string }>;
};

async function conflictsFor(bookingId: string): Promise<Conflict[]> {
  const res = await desk$.get('/api/desk/day/conflicts');
  expect(res.status).toBe(200);
  return (res.body.conflicts as Conflict[]).filter((c) => c.sitting.bookingId === bookingId);
}

async function fixOf(bookingId: string, kind: string) {
  const [conflict] = await conflictsFor(bookingId);
  const fix = conflict?.fixes.find((f) => f.fix.kind === kind);
  expect(fix, `a ${kind} fix for ${bookingId}`).toBeDefined();
  return fix!;
}

const auditActions = async (bookingId: string) =>
  (await db().selectFrom('audit_log').select('action').where('entity_id', '=', bookingId).orderBy('at').execute()).map((r) => r.action);

/** When the booking's (only) sitting starts, as booked. */
const startOf = async (bookingId: string) =>
  (
    await db()
      .selectFrom('sittings')
      .select(sql<Date>`lower(during)`.as('start'))
      .where('booking_id', '=', bookingId)
      .executeTakeFirstOrThrow()
  ).start;

const runningLateMessages = (bookingId: string) =>
  db().selectFrom('messages').select(['channel', 'body', 'kind']).where('booking_id', '=', bookingId).where('kind', '=', 'running_late').execute();

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db(), { timeZone: middayZone(), chairs: 1, basins: 1 });
  await openAroundTheClock(db(), salon.salonId);
  runningService = await insertPlannedService(db(), salon.salonId, { plan: runningPlan, name: 'Gloss and rinse' });
  cutService = await insertPlannedService(db(), salon.salonId, { plan: cutPlan, name: 'Cut' });
  washCutService = await insertPlannedService(db(), salon.salonId, { plan: washCutPlan, name: 'Wash and cut' });
  await insertPlannedService(db(), salon.salonId, { plan: tonerPlan, name: 'Toner refresh' });
  deskUser = await insertUser(db(), salon.salonId, 'front_desk');
  desk$ = await signedInAgent(t.app, deskUser.email, deskUser.password);
  const c = await insertUser(db(), salon.salonId, 'client');
  client$ = await signedInAgent(t.app, c.email, c.password);
  const elsewhere = await insertSalon(db());
  const otherDesk = await insertUser(db(), elsewhere.salonId, 'front_desk');
  otherSalonDesk$ = await signedInAgent(t.app, otherDesk.email, otherDesk.password);
});
afterAll(() => t.close());

describe('a tap that runs late', () => {
  it('answers the conflict it makes for the later booking, with fixes best first in plain words; the desk reads the same', async () => {
    const { a, running } = await overrun();
    await stylist(); // someone free with the skill, for the hand-over
    const later = await laterCut(a);
    const res = await finishApply(a.agent, running);
    expect(res.status).toBe(200);
    expect(res.body.sitting.steps[0].actualEnd).not.toBeNull();
    const mine = (res.body.replan.conflicts as Conflict[]).filter((c) => c.sitting.bookingId === later.id);
    expect(mine).toHaveLength(1);
    const [conflict] = mine;
    expect(conflict).toMatchObject({ kind: 'hands', cause: { bookingId: running }, sitting: { clientName: `Later Client ${scene}` } });
    // Develops starts now (rounded up onto the grid) for its booked 40 min, so the rinse runs 10 min into the cut at 40.
    expect(conflict!.minutes).toBe(10);
    expect(conflict!.words).toMatch(
      new RegExp(`^Running Client ${scene}’s sitting now runs ${conflict!.minutes} min into Later Client ${scene}’s .*: both need .*’s hands\\.$`),
    );
    // Every free stylist with the skill is offered a hand-over (other tests' stylists too), the rest once each.
    expect([...new Set(conflict!.fixes.map((f) => f.fix.kind))]).toEqual(['developing', 'hand_over', 'late_start', 'another_day']);
    expect(conflict!.fixes[0]!.words).toMatch(/^Shorten “Develops” for Running Client \d+ to (25|30) min$/);
    expect(conflict!.fixes.find((f) => f.fix.kind === 'late_start')!.words).toMatch(/^Start Later Client \d+ (10|15) min late, at .*, and tell them$/);
    // The client is told the least late start that works: the rinse ends 10 or 15 minutes after the cut's time.
    expect(conflict!.tellMinutes).toBe(conflict!.fixes.find((f) => f.fix.kind === 'late_start')!.fix.minutesLate);

    const desk = await conflictsFor(later.id);
    expect(desk.map((c) => c.fixes.map((f) => f.fix))).toEqual([conflict!.fixes.map((f) => f.fix)]);
  });

  it('the desk’s conflicts for another day are none: that day runs as booked', async () => {
    const res = await desk$.get('/api/desk/day/conflicts?date=2031-01-07');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ date: '2031-01-07', conflicts: [], freed: [] });
  });

  it('an early finish answers the freed minutes, and they show as a hands-free window with its fits', async () => {
    scene++;
    const a = await stylist();
    const chair = await unit('chairs', `Scene ${scene} chair`);
    const basin = await unit('basins', `Scene ${scene} basin`);
    const id = await bookStepsAt(db(), {
      salonId: salon.salonId,
      serviceId: runningService,
      stylistId: a.staffId,
      clientId: await client(`Early Client ${scene}`),
      chairId: chair,
      plan: runningPlan,
      steps: [
        { kind: 'hands_on', label: 'Apply', from: -40, to: -20 },
        { kind: 'developing', label: 'Develops', from: -20, to: 20 },
        { kind: 'basin', label: 'Rinse', from: 20, to: 60, basinId: basin },
      ],
    });
    await seedActuals(db(), id, [
      [-40, -30],
      [-30, -10],
      [-10, null],
    ]);
    const res = await a.agent.write('post', `/api/bookings/${id}/sittings/1/steps/3/finish`);
    expect(res.status).toBe(200);
    expect(res.body.sitting.status).toBe('finished');
    const [freed] = res.body.replan.freed;
    // The rinse was booked for minutes 20..60 and is done: those 40 minutes of hands are free.
    expect(freed).toMatchObject({ stylistId: a.staffId, minutes: 40 });
    const windows = await a.agent.get('/api/windows');
    const window = windows.body.windows.find((w: { freed: boolean }) => w.freed);
    expect(window).toMatchObject({ stylistId: a.staffId, start: freed.start, end: freed.end, freed: true });
    expect(window.fits.map((f: { name: string }) => f.name)).toContain('Toner refresh');
  });
});

describe('applying a fix', () => {
  it('developing: the running sitting is written as it now runs, the later booking keeps its time, audited', async () => {
    const { a, running } = await overrun();
    const later = await laterCut(a);
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const fix = await fixOf(later.id, 'developing');
    expect(fix.bookingId).toBe(running);
    const res = await desk$.write('post', fixPath(fix.bookingId), { fix: fix.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.done).toMatch(/^Shorten “Develops” .*: done\.$/);
    expect(res.body.day.conflicts.filter((c: Conflict) => c.sitting.bookingId === later.id)).toEqual([]);
    const steps = await db()
      .selectFrom('booking_steps as st')
      .innerJoin('sittings as si', 'si.id', 'st.sitting_id')
      .select(['st.seq', sql<Date>`lower(st.during)`.as('start'), sql<Date>`upper(st.during)`.as('end')])
      .where('si.booking_id', '=', running)
      .orderBy('st.seq')
      .execute();
    expect((steps[1]!.end.getTime() - steps[1]!.start.getTime()) / 60_000).toBe(fix.fix.minutes);
    expect(steps[2]!.start.getTime()).toBe(steps[1]!.end.getTime());
    expect(await auditActions(running)).toContain(`set “Develops” of sitting 1 to ${fix.fix.minutes} min (running late)`);
    expect((await runningLateMessages(later.id)).length).toBe(0);
  });

  it('hand_over: the later client goes to the free stylist at the same time, through the move (audit, change notice)', async () => {
    const { a, running } = await overrun();
    const b = await stylist();
    const later = await laterCut(a);
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const [conflict] = await conflictsFor(later.id);
    const fix = conflict!.fixes.find((f) => f.fix.kind === 'hand_over' && f.fix.stylistId === b.staffId)!;
    expect(fix.words).toMatch(new RegExp(`^Hand Later Client ${scene} over to Stylist \\d+ at `));
    const before = await startOf(later.id);
    const res = await desk$.write('post', fixPath(later.id), { fix: fix.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const booking = await db().selectFrom('bookings').select('stylist_id').where('id', '=', later.id).executeTakeFirstOrThrow();
    expect(booking.stylist_id).toBe(b.staffId);
    const after = await startOf(later.id);
    expect(after.getTime()).toBe(before.getTime());
    expect(await auditActions(later.id)).toContain('moved sitting 1 (running late)');
    // The client is told through the message pipeline: one change notice per channel they take, never two.
    const notices = await db().selectFrom('messages').select('channel').where('booking_id', '=', later.id).where('kind', '=', 'change').execute();
    expect(notices.map((n) => n.channel).sort()).toEqual(['email', 'sms']);
    expect(await runningLateMessages(later.id)).toHaveLength(0);
  });

  it('hand_over of one sitting of several: not offered (every sitting stays with the booking’s stylist), the next fix says why', async () => {
    const { a, running } = await overrun();
    const b = await stylist();
    const chair = await unit('chairs', `Scene ${scene} course chair`);
    const clientId = await client(`Course Client ${scene}`);
    const day = 24 * 60;
    const at = (minute: number) => new Date(Math.floor(Date.now() / 300_000) * 300_000 + minute * 60_000);
    const coursePlan: StepPlan = { sittings: [cutPlan.sittings[0]!, { ...cutPlan.sittings[0]!, daysAfterPrevious: { min: 7, max: 7 } }] };
    // Sitting 1 is A's next client today (40..70); sitting 2 is a week later with A.
    const course = await insertBooking(db(), {
      salonId: salon.salonId,
      clientId,
      serviceId: cutService,
      stylistId: a.staffId,
      status: 'booked',
      stepPlan: coursePlan,
      priceCents: 10000,
      depositCents: 0,
      createdBy: null,
      sittings: [40, 7 * day + 40].map((from) => ({
        chairId: chair,
        steps: [{ kind: 'hands_on' as const, label: 'Cut', start: at(from), end: at(from + 30), basinId: null }],
      })),
    });
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const [conflict] = await conflictsFor(course);
    expect(conflict, 'the course’s first sitting meets the overrun').toBeDefined();
    expect(conflict!.fixes.map((f) => f.fix.kind)).not.toContain('hand_over');
    const late = conflict!.fixes.find((f) => f.fix.kind === 'late_start')!;
    expect(late.words).toMatch(
      new RegExp(
        `^Start Course Client ${scene} \\d+ min late, .* \\(not handed over: Course Client ${scene}’s booking has more than one sitting, and every sitting of a booking stays with its stylist, Stylist \\d+\\)$`,
      ),
    );

    // A hand-over asked for anyway is not on offer: refused, nothing stored.
    const sittingId = late.fix.sittingId as string;
    const forced = await desk$.write('post', fixPath(course), { fix: { kind: 'hand_over', sittingId, stylistId: b.staffId } });
    expect(forced.status).toBe(409);
    expect(forced.body.error.code).toBe('STALE_FIX');

    // The next fix works, and both sittings keep A.
    const res = await desk$.write('post', fixPath(course), { fix: late.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const stylists = await db()
      .selectFrom('booking_steps as st')
      .innerJoin('sittings as si', 'si.id', 'st.sitting_id')
      .select('st.stylist_id')
      .where('si.booking_id', '=', course)
      .where('st.live', '=', true)
      .execute();
    expect(new Set(stylists.map((x) => x.stylist_id))).toEqual(new Set([a.staffId]));
    expect(await runningLateMessages(course)).toHaveLength(1);
  });

  it('late_start: the later sitting moves by the delay and its client gets one "running late" message, never a second', async () => {
    const { a, running } = await overrun();
    const later = await laterCut(a);
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const [conflict] = await conflictsFor(later.id);
    const fix = conflict!.fixes.find((f) => f.fix.kind === 'late_start')!;
    const minutes = fix.fix.minutesLate as number;

    // "Tell the client" first: one message; asked again, nothing more.
    const told = await desk$.write('post', tellPath(later.id), { minutesLate: minutes });
    expect(told.status, JSON.stringify(told.body)).toBe(200);
    expect(told.body).toMatchObject({ sent: true });
    expect(told.body.words).toMatch(new RegExp(`^Told Later Client ${scene} by text: running about ${minutes} minutes late — see you at `));
    const again = await desk$.write('post', tellPath(later.id), { minutesLate: minutes });
    expect(again.body).toMatchObject({ sent: false });
    const wrongDelay = await desk$.write('post', tellPath(later.id), { minutesLate: minutes + 30 });
    expect(wrongDelay.status).toBe(409);
    expect(wrongDelay.body.error.code).toBe('STALE_FIX');

    const before = await startOf(later.id);
    const res = await desk$.write('post', fixPath(later.id), { fix: fix.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.done).toMatch(/already been told/);
    const after = await startOf(later.id);
    expect((after.getTime() - before.getTime()) / 60_000).toBe(minutes);
    expect(await auditActions(later.id)).toContain('moved sitting 1 (running late)');

    const sent = await runningLateMessages(later.id);
    expect(sent).toHaveLength(1);
    expect(sent[0]).toMatchObject({ channel: 'sms' });
    expect(sent[0]!.body).toMatch(new RegExp(`running about ${minutes} minutes late — see you at \\d{1,2}:\\d{2}\\s?[AP]M\\.`));
    // The move's own change notice is not sent as well: the client hears of it once.
    const change = await db().selectFrom('messages').select('id').where('booking_id', '=', later.id).where('kind', '=', 'change').execute();
    expect(change).toHaveLength(0);
    // The database keeps the once-only rule: the same sitting and delay cannot be recorded twice.
    const sitting = await db().selectFrom('sittings').select('id').where('booking_id', '=', later.id).executeTakeFirstOrThrow();
    await expect(
      db().insertInto('running_late_notices').values({ sitting_id: sitting.id, minutes_late: minutes, told_at: new Date(), told_by: null }).execute(),
    ).rejects.toThrow(/duplicate key/);
  });

  it('late_start without telling first: the one message goes with the move', async () => {
    const { a, running } = await overrun();
    const later = await laterCut(a);
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const fix = await fixOf(later.id, 'late_start');
    const res = await desk$.write('post', fixPath(later.id), { fix: fix.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.done).toMatch(/: done\.$/);
    expect(await runningLateMessages(later.id)).toHaveLength(1);
  });

  it('chair: a later client of another stylist is seated elsewhere at the same time', async () => {
    const { a, chair, running } = await overrun();
    const b = await stylist();
    const clientId = await client(`Chair Client ${scene}`);
    const later = await bookStepsAt(db(), {
      salonId: salon.salonId,
      serviceId: cutService,
      stylistId: b.staffId,
      clientId,
      chairId: chair, // A's chair, from when A's client was to leave
      plan: cutPlan,
      steps: [{ kind: 'hands_on', label: 'Cut', from: 40, to: 70 }],
    });
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const [conflict] = await conflictsFor(later);
    expect(conflict).toMatchObject({ kind: 'chair' });
    expect(conflict!.words).toMatch(/both need Scene \d+ chair\.$/);
    const fix = conflict!.fixes.find((f) => f.fix.kind === 'chair')!;
    expect(fix.words).toMatch(/^Seat Chair Client \d+ in /);
    const res = await desk$.write('post', fixPath(later), { fix: fix.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const sitting = await db().selectFrom('sittings').select('chair_id').where('booking_id', '=', later).executeTakeFirstOrThrow();
    expect(sitting.chair_id).toBe(fix.fix.chairId);
    expect(await auditActions(later)).toContain('changed the chair of sitting 1 (running late)');
  });

  it('basin: a basin step not started yet moves to another basin', async () => {
    const { a, basin, running } = await overrun();
    const b = await stylist();
    const later = await bookStepsAt(db(), {
      salonId: salon.salonId,
      serviceId: washCutService,
      stylistId: b.staffId,
      clientId: await client(`Basin Client ${scene}`),
      chairId: await unit('chairs', `Scene ${scene} wash chair`),
      plan: washCutPlan,
      steps: [
        { kind: 'basin', label: 'Wash', from: 40, to: 55, basinId: basin },
        { kind: 'hands_on', label: 'Cut', from: 55, to: 85 },
      ],
    });
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const [conflict] = await conflictsFor(later);
    expect(conflict).toMatchObject({ kind: 'basin' });
    const fix = conflict!.fixes.find((f) => f.fix.kind === 'basin')!;
    const res = await desk$.write('post', fixPath(fix.bookingId), { fix: fix.fix });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const step = await db()
      .selectFrom('booking_steps')
      .select('basin_id')
      .where('id', '=', fix.fix.stepId as string)
      .executeTakeFirstOrThrow();
    expect(step.basin_id).toBe(fix.fix.basinId);
    expect((await auditActions(fix.bookingId)).some((x) => /^changed the basin of sitting 1 step \d “\w+” \(running late\)$/.test(x))).toBe(true);
  });
});

describe('refused fixes', () => {
  it('a forged fix, a stale one, another salon and the wrong roles: refused, nothing stored', async () => {
    const { a, running } = await overrun();
    const later = await laterCut(a);
    expect((await finishApply(a.agent, running)).status).toBe(200);
    const fix = await fixOf(later.id, 'late_start');
    const snapshot = async () => ({
      sitting: await db()
        .selectFrom('sittings')
        .select(['chair_id', sql<string>`during::text`.as('during')])
        .where('booking_id', '=', later.id)
        .executeTakeFirstOrThrow(),
      audit: await auditActions(later.id),
      messages: (await db().selectFrom('messages').select('id').where('booking_id', '=', later.id).execute()).length,
    });
    const before = await snapshot();

    const forged = await desk$.write('post', fixPath(later.id), { fix: { ...fix.fix, minutesLate: 5, start: new Date(Date.now() + 3_600_000).toISOString() } });
    expect(forged.status).toBe(409);
    expect(forged.body.error).toMatchObject({ code: 'STALE_FIX' });
    expect(forged.body.error.message).toMatch(/no longer offered .*Nothing was changed/);
    const otherChair = await desk$.write('post', fixPath(later.id), { fix: { kind: 'chair', sittingId: fix.fix.sittingId, chairId: salon.chairs[0] } });
    expect(otherChair.status).toBe(409);
    const wrongBooking = await desk$.write('post', fixPath(running), { fix: fix.fix });
    expect(wrongBooking.status).toBe(409);
    const malformed = await desk$.write('post', fixPath(later.id), { fix: { kind: 'another_day', sittingId: fix.fix.sittingId } });
    expect(malformed.status).toBe(400);
    expect((await otherSalonDesk$.write('post', fixPath(later.id), { fix: fix.fix })).status).toBe(404);
    expect((await client$.write('post', fixPath(later.id), { fix: fix.fix })).status).toBe(403);
    expect((await a.agent.write('post', fixPath(later.id), { fix: fix.fix })).status).toBe(403);
    expect((await otherSalonDesk$.get('/api/desk/day/conflicts')).body.conflicts).toEqual([]);
    expect(await snapshot()).toEqual(before);

    // Applied once, the same fix is stale: the conflict is gone.
    expect((await desk$.write('post', fixPath(later.id), { fix: fix.fix })).status).toBe(200);
    const twice = await desk$.write('post', fixPath(later.id), { fix: fix.fix });
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('STALE_FIX');
  });

  it('after every fix the book holds no chair, basin or hands twice', async () => {
    const overlaps = await sql<{ n: number }>`
      select count(*)::int as n from booking_steps x join booking_steps y on x.id < y.id and x.live and y.live and x.during && y.during
      where (x.stylist_id = y.stylist_id and x.kind in ('hands_on', 'basin') and y.kind in ('hands_on', 'basin')) or x.basin_id = y.basin_id`.execute(db());
    expect(overlaps.rows[0]!.n).toBe(0);
  });
});
