import { EU_HAIR_LIMIT_WORDS, strengthWords } from '@shared/calculators/developer';
import { Notice } from '@client/components/ui/notice';

/** Shown wherever bowls are mixed: peroxide and persulfate powders hurt skin, eyes and lungs. */
export function MixLogCaution({ maxPercent }: { maxPercent: number }) {
  return (
    <Notice tone="caution" title="Mix safely">
      <ul className="list-disc pl-5">
        <li>Wear disposable non-latex gloves to mix, apply and rinse; change them between clients.</li>
        <li>Mix powder lightener where the air moves, with lids closed and little dust. Peroxide in the eyes: rinse at once.</li>
        <li>
          Developer above this salon's maximum of {strengthWords(maxPercent)} is refused. {EU_HAIR_LIMIT_WORDS}
        </li>
        <li>Dwell's numbers are aids. The licensed professional's judgement and local regulations decide.</li>
      </ul>
    </Notice>
  );
}
