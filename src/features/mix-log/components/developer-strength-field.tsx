import { useState } from 'react';
import { useController, type Control } from 'react-hook-form';
import { percentToVolume, strengthWords, volumeToPercent } from '@shared/calculators/developer';
import type { WriteMixLog } from '@shared/schemas/mix-log.schemas';
import { TextField } from '@client/components/ui/text-field';

type Props = { control: Control<WriteMixLog>; maxPercent: number };

// Empty means "no developer" (null), never 0.
const parse = (text: string) => (text.trim() === '' ? null : Number(text));
const usable = (n: number | null): n is number => n !== null && Number.isFinite(n) && n >= 0;
const hundredths = (n: number) => Math.round(n * 100) / 100;
const percentText = (percent: number | null) => (percent === null ? '' : String(percent));
const volumeText = (percent: number | null) => (usable(percent) ? String(hundredths(percentToVolume(percent, { trade: true }))) : '');
const percentOfVolume = (text: string) => {
  const vol = parse(text);
  return usable(vol) ? hundredths(volumeToPercent(vol, { trade: true })) : vol;
};

/**
 * The bowl's developer strength, in percent and in trade volumes (bottles are labelled either way). One form
 * value sits behind both boxes: each shows what was typed in it while that still means the form's value, and
 * the value itself otherwise, so typing in one updates the other at once and a reset shows in both.
 */
export function DeveloperStrengthField({ control, maxPercent }: Props) {
  const { field, fieldState } = useController({ control, name: 'developerPercent' });
  const value = field.value;
  const [typedPercent, setTypedPercent] = useState(percentText(value));
  const [typedVolume, setTypedVolume] = useState(volumeText(value));
  const [volumeError, setVolumeError] = useState<string | undefined>();
  const percentShown = Object.is(parse(typedPercent), value) ? typedPercent : percentText(value);
  const volumeShown = volumeError || Object.is(percentOfVolume(typedVolume), value) ? typedVolume : volumeText(value);
  const over = usable(value) && value > maxPercent;

  const onPercent = (text: string) => {
    setTypedPercent(text);
    setVolumeError(undefined);
    field.onChange(parse(text));
  };
  const onVolume = (text: string) => {
    setTypedVolume(text);
    const vol = parse(text);
    if (vol !== null && !usable(vol)) {
      setVolumeError('Volumes are a number of 0 or more.');
      return;
    }
    setVolumeError(undefined);
    field.onChange(percentOfVolume(text));
  };

  return (
    <div className="flex flex-wrap items-start gap-3">
      <TextField
        label="Developer strength (%)"
        hint={`Salon maximum ${strengthWords(maxPercent)}. Empty: no developer.`}
        type="number"
        step="0.1"
        min={0}
        inputMode="decimal"
        className="w-64"
        name={field.name}
        ref={field.ref}
        value={percentShown}
        onBlur={field.onBlur}
        onChange={(e) => onPercent(e.target.value)}
        error={fieldState.error?.message ?? (over ? `Above this salon's maximum of ${strengthWords(maxPercent)}; it will be refused.` : undefined)}
      />
      <TextField
        label="Developer strength (vol)"
        hint="Trade volumes: 3/6/9/12 % = 10/20/30/40 vol."
        type="number"
        step="1"
        min={0}
        inputMode="decimal"
        className="w-64"
        value={volumeShown}
        onChange={(e) => onVolume(e.target.value)}
        error={volumeError}
      />
    </div>
  );
}
