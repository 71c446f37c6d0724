import { bowlPercent, percentToVolume, ratioBowlPercent, strengthWords, volumeToPercent } from '@shared/calculators/developer';
import type { MixPart } from '@shared/schemas/mix-log.schemas';

type Props = { developerPercent: number | null; ratio: string; parts: Pick<MixPart, 'kind' | 'grams'>[] };

const hundredths = (n: number) => String(Math.round(n * 100) / 100);

/**
 * The peroxide that ends up on the hair: from the weighed parts when developer grams are written (developer
 * at its strength, every other part at 0 %), otherwise from the ratio with developer as its last part.
 */
function onTheHair(developerPercent: number, ratio: string, parts: Props['parts']): { percent: number; from: string } | null {
  const weighed = parts.filter((p) => Number.isFinite(p.grams) && p.grams >= 0);
  if (weighed.some((p) => p.kind === 'developer' && p.grams > 0)) {
    return {
      percent: bowlPercent(weighed.map((p) => ({ grams: p.grams, peroxidePercent: p.kind === 'developer' ? developerPercent : 0 }))),
      from: 'the weighed parts',
    };
  }
  try {
    return ratio ? { percent: ratioBowlPercent(ratio, developerPercent), from: `${ratio} (developer last)` } : null;
  } catch {
    return null; // the form shows the ratio's own message
  }
}

/** Small aid beside the bowl form: the strength by the definition of volume, and what the bowl puts on the hair. */
export function DeveloperHelper({ developerPercent, ratio, parts }: Props) {
  if (developerPercent === null || !Number.isFinite(developerPercent) || developerPercent < 0) return null;
  const volume = percentToVolume(developerPercent, { trade: true });
  const hair = onTheHair(developerPercent, ratio, parts);
  return (
    <div className="flex flex-col gap-2 rounded-lg bg-linen p-3 text-sm" aria-label="Developer helper" role="group" aria-live="polite">
      <p className="tabular">
        <span className="font-bold">{strengthWords(developerPercent)}</span>: by the definition of volume (1 L releases {hundredths(volume)} L of oxygen) that
        is {hundredths(volumeToPercent(volume))} % hydrogen peroxide; bottles round 1 vol to 0.3 %.
      </p>
      {hair && (
        <p className="tabular">
          From {hair.from}, the bowl is about <span className="font-bold">{strengthWords(hair.percent)}</span> peroxide on the hair.
        </p>
      )}
    </div>
  );
}
