import type { Cautions } from '@shared/schemas/online-booking.schemas';
import { skinTestWords } from '@shared/rules/skin-test-words';

/**
 * The cautions a client accepts before paying. The version is stored with each acceptance, so a later change
 * of wording never rewrites what someone agreed to. Wording follows the EU standard warning for oxidative hair
 * dyes (Regulation (EC) No 1223/2009, Annex III) and the 48-hour allergy alert test (Cosmetics Europe
 * Recommendation No 27), with the salon's own lead time.
 */
export function cautionsFor(service: { category: string; needsSkinTest: boolean }, leadHours: number): Cautions {
  const items: Cautions['items'] = [
    {
      id: 'chemical-risks',
      title: 'Colour and lightening chemicals',
      text: 'Hair colourants can cause severe allergic reactions, and lightener can irritate or burn the skin and scalp and damage hair. Tell us about any rash, sensitive, irritated or damaged scalp, and any reaction you have had to hair colour or a temporary "black henna" tattoo: then colour must not go ahead without advice.',
    },
  ];
  if (service.needsSkinTest || service.category === 'consultation' || service.category === 'skin_test') {
    items.push({
      id: 'skin-test',
      title: 'Skin test before oxidative colour',
      text: skinTestWords(leadHours),
    });
  }
  if (service.category === 'consultation') {
    items.push({
      id: 'consultation-limits',
      title: 'What a consultation can and cannot promise',
      text: 'A consultation gives an estimate of the steps, sittings, time and price from what we can see and test. Hair that was coloured before, especially with box dye or henna, can behave unexpectedly: the plan may change and some results may need several sittings or may not be safely reachable.',
    });
  }
  items.push({
    id: 'professional-judgement',
    title: 'Licensed judgement and local rules',
    text: "Your stylist may stop or change a service to protect your skin and hair. Dwell does not replace a licensed professional's judgement or local regulations.",
  });
  return { version: `v2:${items.map((i) => i.id.slice(0, 3)).join('-')}`, items };
}
