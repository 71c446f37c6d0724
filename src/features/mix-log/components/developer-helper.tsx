import { useState } from 'react';
import { percentToVolume, ratioBowlPercent, volumeToPercent } from '../../../../shared/calculators/developer';

const show = (n: number) => (Number.isFinite(n) ? String(Math.round(n * 100) / 100) : '—');

/** Small aid beside the bowl form: vol ↔ % and the peroxide % that ends up on the hair. */
export function DeveloperHelper({ developerPercent, ratio }: { developerPercent: number | null; ratio: string }) {
  const [volume, setVolume] = useState('20');
  const vol = Number(volume);
  let onHair: string | null = null;
  if (developerPercent !== null && ratio) {
    try {
      onHair = show(ratioBowlPercent(ratio, developerPercent));
    } catch {
      onHair = null; // the form shows the ratio's own message
    }
  }
  return (
    <div className="flex flex-col gap-2 rounded-lg bg-linen p-3 text-sm" aria-label="Developer helper" role="group">
      <label className="flex flex-wrap items-center gap-2">
        <span className="font-bold">Volume</span>
        <input type="number" min={0} step={1} value={volume} onChange={(e) => setVolume(e.target.value)} className="w-20 rounded border border-ink/40 px-2 py-1" />
        <span className="tabular">
          = {vol >= 0 ? show(volumeToPercent(vol, { trade: true })) : '—'} % on the bottle ({vol >= 0 ? show(volumeToPercent(vol)) : '—'} % by the definition)
        </span>
      </label>
      {developerPercent !== null && developerPercent >= 0 && (
        <p className="tabular">
          {show(developerPercent)} % ≈ {show(percentToVolume(developerPercent, { trade: true }))} vol
        </p>
      )}
      {onHair && (
        <p className="tabular">
          At {ratio} (developer last), the bowl is about <span className="font-bold">{onHair} %</span> peroxide.
        </p>
      )}
    </div>
  );
}
