/**
 * Aftercare by kind of colour work, in one place (common practice for professional colour; general guidance,
 * not product instructions). The kind is read from the service's category and name, since services carry no
 * finer type than their category.
 */
export type AftercareKind = 'lightening' | 'vivid' | 'correction' | 'toner' | 'permanent';

const NOTES: Record<AftercareKind, string> = {
  lightening:
    'Wait 48 hours before the first wash.\nUse a sulphate-free shampoo and a weekly bond-building or moisture treatment.\nKeep heat styling low and always use a heat protector.\nWear a hat or UV protection in strong sun, and rinse after swimming pools (chlorine can turn light hair green).',
  vivid:
    'Wait 72 hours before the first wash, then wash in cool water only.\nUse a sulphate-free shampoo; expect some colour on towels and pillows at first.\nVivid shades fade fastest: a colour-depositing conditioner between visits helps.',
  correction:
    'Wait 48 hours before the first wash.\nThe hair has been through a lot: a weekly bond-building treatment, low heat and no home colour until your stylist says so.\nTell us at once if the colour shifts or the scalp is sore before your next sitting.',
  toner: 'Wait 24 hours before washing.\nToner fades over 4–8 weeks; a purple or blue shampoo once a week keeps brassiness away.',
  permanent: 'Wait 48 hours before the first wash.\nUse a colour-safe, sulphate-free shampoo and cool water.\nProtect from strong sun and chlorine.',
};

/** Which aftercare a colour service gets; null for services that need none (cuts, consultations…). */
export function aftercareKind(category: string, serviceName: string): AftercareKind | null {
  if (category !== 'colour') return null;
  const name = serviceName.toLowerCase();
  if (name.includes('correction')) return 'correction';
  if (name.includes('vivid')) return 'vivid';
  if (/lighten|bleach|balayage|highlight/.test(name)) return 'lightening';
  if (/toner|gloss/.test(name)) return 'toner';
  return 'permanent';
}

export const aftercareNotes = (kind: AftercareKind) => NOTES[kind];
