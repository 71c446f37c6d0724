import { describeHoursRule } from '@shared/engine/describe-hours';
import { planNeedsSkinTest } from '@shared/rules/skin-test-need';
import { skinTestValidityWords, skinTestWords } from '@shared/rules/skin-test-words';
import type { Db } from '@server/db/database';
import type { PublicSalon } from '@shared/schemas/online-booking.schemas';
import { formatMoney } from '@shared/money/money';
import { formatClock } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatPhone } from '@shared/format/phone';
import { todayIn } from '@shared/time/salon-time';
import { listSalonHours } from '../salon';
import { listServices, listStylistDetails } from '../services';
import { findSalonBySlug } from './public-salon.repository';

/** The salon's public page: services, hours and policies. Nothing about any client. */
export async function publicSalon(db: Db, slug: string): Promise<PublicSalon> {
  const salon = await findSalonBySlug(db, slug);
  const [hours, services, stylists] = await Promise.all([listSalonHours(db, salon.id), listServices(db, salon.id), listStylistDetails(db, salon.id)]);
  const families = salon.skinTestFamilies;
  const today = todayIn(salon.timeZone, new Date());
  const format = formatFor(salon.timeZone);
  const deposits = services.filter((s) => s.depositCents > 0).map((s) => `${s.name}: ${formatMoney(s.depositCents, salon.currency)}`);
  return {
    slug: salon.slug,
    name: salon.name,
    address: salon.address,
    phone: salon.phone,
    // Written here, so the public page needs no phone-number metadata of its own.
    phoneText: formatPhone(salon.phone, salon.country),
    timeZone: salon.timeZone,
    currency: salon.currency,
    // Each rule in plain words with the day's opening times; closed dates already past are left out.
    openingHours: hours.map((h) => `${describeHoursRule(h.rrule, today)}, ${formatClock(h.start, format)} – ${formatClock(h.end, format)}`),
    policies: {
      deposit: deposits.length
        ? `A deposit secures long colour work and consultations: ${deposits.join('; ')}. It counts towards the price.`
        : 'No deposit is needed.',
      cancellation: `Cancel or move at least ${salon.cancellationWindowHours} hours before your appointment and your deposit is refunded; later, or if you do not come, the deposit is kept.`,
      lateness: 'If you are more than 15 minutes late for a long colour service we may need to shorten or move it, because colour cannot be rushed.',
      skinTest: `${skinTestWords(salon.skinTestLeadHours)} ${skinTestValidityWords(salon.skinTestValidityDays)}`,
    },
    services: services.map((s) => ({
      id: s.id,
      name: s.name,
      description: s.description,
      category: s.category,
      typicalMinutes: s.stepPlan.sittings.reduce(
        (t, sit) => t + sit.steps.reduce((m, st) => m + (st.kind === 'developing' ? Math.round((st.minMinutes + st.maxMinutes) / 2) : st.minutes), 0),
        0,
      ),
      priceCents: s.priceCents,
      priceIsFrom: s.priceIsFrom,
      depositCents: s.depositCents,
      onlineBookable: s.onlineBookable,
      skill: s.skill,
      // From the steps (and the service's own box, which only adds), as at every booking door.
      needsSkinTest: planNeedsSkinTest(s.stepPlan, families, s.needsSkinTest),
    })),
    stylists: stylists.map((s) => ({ id: s.id, name: s.name, skills: s.skills })),
  };
}
