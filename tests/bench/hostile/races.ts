import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { anonymousSession, sendJson, signIn, type HttpSession } from '../load/http-session';
import type { WalkIds } from '../../integration/fuzz/walk-ids';
import { cashInsteadRace } from './checkout-race';

/** One race's outcome: what it sent, how it was answered, and what breaks the rule (empty when none). */
export interface RaceFigure {
  name: string;
  answers: Record<number, number>;
  figure: string;
  broken: string[];
}

const count = (statuses: number[]) => statuses.reduce<Record<number, number>>((m, s) => ({ ...m, [s]: (m[s] ?? 0) + 1 }), {});
const from = (address: string) => ({ 'x-forwarded-for': address });
const times = <T>(n: number, make: (i: number) => Promise<T>) => Promise.all(Array.from({ length: n }, (_, i) => make(i)));

/** Exactly one answer is `won`, every other one 409: the rule for ten writes of one unique thing. */
function oneWinner(name: string, statuses: number[], won: number, figure: string): RaceFigure {
  const answers = count(statuses);
  const ok = answers[won] === 1 && answers[409] === statuses.length - 1;
  return { name, answers, figure, broken: ok ? [] : [`${name}: ${JSON.stringify(answers)}, not one ${won} and the rest 409`] };
}

/**
 * The races of issue 18 against a running server (`url`, the demo salon, loopback trusted), each reported with its
 * figures: sign-in guesses sent at once, unique writes sent ten at a time, one idempotency key with two requests,
 * one hold claimed by five clients and paid from ten tabs, one checkout's card part taken in cash from five tabs. `untrustedUrl` is a second server that trusts no proxy.
 */
export async function runRaces(url: string, untrustedUrl: string, db: Kysely<Database>, ids: WalkIds): Promise<RaceFigure[]> {
  const figures: RaceFigure[] = [];
  const owner = 'owner@demo.test';
  // Signed in before the attack below (this address is then one the owner uses, with its own allowance).
  const ownerSession = await signIn(url, owner, DEMO_PASSWORD);
  const desk = await signIn(url, 'desk@demo.test', DEMO_PASSWORD);

  // The owner has signed in from home before; then 60 guesses arrive at once from 60 other addresses.
  const home = '10.18.200.1';
  const login = (session: HttpSession, password: string, address: string) =>
    sendJson(url, session, 'POST', '/api/session', { email: owner, password }, from(address));
  await login(await anonymousSession(url), DEMO_PASSWORD, home);
  const before = await db.selectFrom('sign_in_attempts').select('id').where('email', '=', owner).where('succeeded', '=', false).execute();
  const guessers = await times(60, () => anonymousSession(url));
  const guesses = await Promise.all(guessers.map((s, i) => login(s, `wrong-guess-${i}`, `10.18.201.${i + 1}`)));
  const checked =
    (await db.selectFrom('sign_in_attempts').select('id').where('email', '=', owner).where('succeeded', '=', false).execute()).length - before.length;
  const stranger = await login(await anonymousSession(url), DEMO_PASSWORD, '10.18.202.1');
  const ownerBack = await login(await anonymousSession(url), DEMO_PASSWORD, home);
  figures.push({
    name: '60 concurrent wrong passwords for one account',
    answers: count(guesses.map((g) => g.status)),
    figure: `${checked} checked (limit 5); the right password from a stranger's address ${stranger.status}, from the owner's own address ${ownerBack.status}`,
    broken: [
      ...(checked > 5 ? [`${checked} guesses checked, more than 5`] : []),
      ...(ownerBack.status !== 200 ? [`the owner was refused from their own address (${ownerBack.status})`] : []),
      ...(stranger.status !== 429 ? [`the right password from a stranger's address answered ${stranger.status} during the attack, not 429`] : []),
    ],
  });

  // A caller rotating X-Forwarded-For at a server that trusts no proxy: still one address.
  const rotating = await anonymousSession(untrustedUrl);
  const resets: number[] = [];
  for (let i = 0; i < 12; i++) {
    resets.push(
      (await sendJson(untrustedUrl, rotating, 'POST', '/api/password-reset', { email: `nobody${i}@example.test` }, from(`10.18.203.${i + 1}`))).status,
    );
  }
  const firstRefused = resets.indexOf(429) + 1;
  figures.push({
    name: 'password resets with a new X-Forwarded-For each, at a server that trusts no proxy',
    answers: count(resets),
    figure: `the limit (10) refused request ${firstRefused || 'none'}`,
    broken: firstRefused === 11 ? [] : [`rotating X-Forwarded-For changed the limit: first 429 at request ${firstRefused || 'never'}`],
  });

  const signUp = { name: 'Race Ash', email: 'race.hostile@example.test', phone: '+1 970 555 0199', password: 'copper-kettle-meadow-7' };
  const signUps = await Promise.all(
    (await times(10, () => anonymousSession(url))).map((s, i) => sendJson(url, s, 'POST', '/api/sign-up', signUp, from(`10.18.204.${i + 1}`))),
  );
  figures.push(
    oneWinner(
      '10 sign-ups with one e-mail',
      signUps.map((r) => r.status),
      201,
      'one account',
    ),
  );

  const hours = [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:00' }];
  const invite = { email: 'race.invite@example.test', details: { name: 'Race Vale', role: 'stylist', skills: ['colour'], maxClientsAtOnce: 1, hours } };
  const invites = await times(10, () => sendJson(url, ownerSession, 'POST', '/api/owner/setup/staff', invite));
  figures.push(
    oneWinner(
      '10 staff invites with one e-mail',
      invites.map((r) => r.status),
      201,
      'one member of staff',
    ),
  );

  const booking = ids.byKind.booking;
  const bowl = {
    sittingSeq: 1,
    bowlNo: 9,
    productType: 'toner',
    shadeNotes: '9V',
    developerPercent: 3,
    ratio: '1:2',
    grams: [{ kind: 'toner', part: '9V', grams: 30 }],
  };
  const bowls = await times(10, () =>
    sendJson(url, desk, 'POST', `/api/bookings/${booking}/mix-logs`, {
      ...bowl,
      appliedTo: 'All over',
      plannedMinutes: 20,
      actualMinutes: null,
      heat: false,
      resultNotes: '',
    }),
  );
  figures.push(
    oneWinner(
      'one mix-log bowl saved 10 times',
      bowls.map((r) => r.status),
      201,
      'one bowl',
    ),
  );

  // One idempotency key, two different bookings asked for at once.
  const service = await db.selectFrom('services').select(['id', 'step_plan']).where('id', '=', ids.byKind.service!).executeTakeFirstOrThrow();
  const options = await sendJson(url, desk, 'POST', '/api/booking-options', {
    clientId: ids.byKind.client,
    serviceId: service.id,
    stepPlan: service.step_plan,
    stylistId: null,
    earliestDate: new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10),
  });
  const picked = (options.body?.options ?? []).slice(0, 2) as { stylistId: string; sittings: { start: string }[] }[];
  const keyed = await Promise.all(
    picked.map((o) =>
      sendJson(url, desk, 'POST', '/api/bookings', {
        clientId: ids.byKind.client,
        serviceId: service.id,
        stepPlan: service.step_plan,
        stylistId: o.stylistId,
        start: o.sittings[0]?.start,
        idempotencyKey: 'hostile-one-key-two-requests',
      }),
    ),
  );
  const keyAnswers = count(keyed.map((r) => r.status));
  figures.push({
    name: 'one idempotency key sent with two different bookings at once',
    answers: keyAnswers,
    figure: `${keyAnswers[201] ?? 0} booked, ${keyAnswers[422] ?? 0} refused 422 naming idempotencyKey`,
    broken: picked.length === 2 && keyAnswers[201] === 1 && keyAnswers[422] === 1 ? [] : [`one key, two requests: ${JSON.stringify(keyAnswers)}`],
  });

  figures.push(...(await holdRaces(url, db, ids)));
  figures.push(await cashInsteadRace(url, db, desk));
  return figures;
}

/** A hold claimed by five new clients at once, then paid from ten tabs (ten idempotency keys) by its winner. */
async function holdRaces(url: string, db: Kysely<Database>, ids: WalkIds): Promise<RaceFigure[]> {
  const service = await db
    .selectFrom('services')
    .select('id')
    .where('online_bookable', '=', true)
    .where('category', '=', 'consultation')
    .where('deposit_cents', '>', 0)
    .executeTakeFirstOrThrow();
  const visitor = await anonymousSession(url);
  const from30 = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10);
  const free = await sendJson(
    url,
    visitor,
    'GET',
    `/api/public/salons/${ids.slug}/availability?serviceId=${service.id}&from=${from30}`,
    undefined,
    from('10.18.205.1'),
  );
  const time = free.body.times[0] as { start: string; stylistId: string };
  const hold = await sendJson(
    url,
    visitor,
    'POST',
    '/api/public/holds',
    { salonSlug: ids.slug, serviceId: service.id, stylistId: time.stylistId, start: time.start },
    from('10.18.205.1'),
  );
  const clients = await times(5, async (i) => {
    const s = await anonymousSession(url);
    const email = `hold.racer${i}.${Date.now()}@example.test`;
    const made = await sendJson(
      url,
      s,
      'POST',
      '/api/sign-up',
      { name: `Hold Racer ${i}`, email, phone: `+1 970 555 01${10 + i}`, password: 'copper-kettle-meadow-7' },
      from(`10.18.206.${i + 1}`),
    );
    if (made.status !== 201) throw new Error(`sign-up for the hold race answered ${made.status}`);
    return signIn(url, email, 'copper-kettle-meadow-7');
  });
  const claims = await Promise.all(clients.map((s) => sendJson(url, s, 'POST', `/api/me/holds/${hold.body.holdId}/claim`, { secret: hold.body.holdSecret })));
  const claimAnswers = count(claims.map((c) => c.status));
  const figures: RaceFigure[] = [
    {
      name: 'one hold claimed by 5 clients at once',
      answers: claimAnswers,
      figure: `${claimAnswers[200] ?? 0} owns it`,
      broken:
        claimAnswers[200] === 1 && claims.every((c) => c.status === 200 || c.status === 409 || c.status === 404)
          ? []
          : [`hold claims: ${JSON.stringify(claimAnswers)}`],
    },
  ];
  const winner = clients[claims.findIndex((c) => c.status === 200)];
  const claimed = claims.find((c) => c.status === 200);
  if (!winner || !claimed) return figures;
  await sendJson(url, winner, 'POST', `/api/me/holds/${hold.body.holdId}/cautions`, { version: claimed.body.cautions.version, secret: hold.body.holdSecret });
  // Ten tabs asking to pay at once: the one payment page for this hold comes back to all of them.
  const pays = await times(10, () => sendJson(url, winner, 'POST', `/api/me/holds/${hold.body.holdId}/pay`, { secret: hold.body.holdSecret }));
  const pages = new Set(pays.filter((p) => p.status === 200).map((p) => p.body.checkoutUrl));
  const sessions = await db.selectFrom('checkout_sessions').select('id').where('booking_id', '=', hold.body.holdId).execute();
  figures.push({
    name: 'one hold paid from 10 tabs at once',
    answers: count(pays.map((p) => p.status)),
    figure: `${pages.size} payment page(s), ${sessions.length} session(s) stored`,
    broken:
      pages.size === 1 && sessions.length === 1 && pays.every((p) => p.status === 200)
        ? []
        : [`ten tabs: ${pages.size} pages, ${sessions.length} sessions, answers ${JSON.stringify(count(pays.map((p) => p.status)))}`],
  });
  return figures;
}
