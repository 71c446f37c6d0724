import { useFormContext } from 'react-hook-form';
import type { SalonSettings, SalonSettingsInput } from '@shared/schemas/salon-settings.schemas';
import { HARD_MAX_PROCESSING_MINUTES, LIMITED_FAMILIES, limitedFamilyNames, type LimitedFamily } from '@shared/rules/processing-limits';
import { HAIR_STATES, MAX_LIFT_PER_SITTING, hairStateNames } from '@shared/quotes/lift-per-sitting';
import { SectionCard } from '@client/components/ui/section-card';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';

/** What each limit covers, in trade words (common practice ranges beside the field). */
const limitHints: Record<LimitedFamily, string> = {
  lightener: 'Common practice: about 45–50 min on the head.',
  oxidative_colour: 'Permanent and demi-permanent colour. Common practice: 30–45 min.',
  toner_oxidative: 'Demi-permanent toner or gloss. Common practice: 5–30 min.',
  colour_remover: 'Per application; apply again rather than wait longer. Common practice: 20–60 min.',
};

/** Set-up → Salon: the processing limits every plan is held to, and the lift per sitting the quote rules plan with. */
export function PlanningRulesFields() {
  const form = useFormContext<SalonSettingsInput, unknown, SalonSettings>();
  const err = (name: string) => fieldError(form.formState.errors, name);
  const num = { valueAsNumber: true } as const;
  return (
    <SectionCard title="Processing limits and lift per sitting">
      <div className="flex flex-col gap-4">
        <p className="text-ink/80">
          Minutes a product may stay on the hair, counted from when the first section gets it until it is rinsed. Services, quotes and bookings with a
          developing step over the limit are refused. With heat (a hood or processor) the limit is halved (common practice: heat roughly halves processing
          time). The product’s instructions and local regulations come first: these are the salon’s own upper bounds.
        </p>
        <div className="grid gap-4 md:grid-cols-2">
          {LIMITED_FAMILIES.map((family) => (
            <TextField
              key={family}
              label={`${limitedFamilyNames[family]}, most minutes (at most ${HARD_MAX_PROCESSING_MINUTES[family]})`}
              hint={limitHints[family]}
              type="number"
              inputMode="numeric"
              error={err(`processingLimits.${family}`)}
              {...form.register(`processingLimits.${family}`, num)}
            />
          ))}
        </div>
        <p className="text-ink/80">
          Levels one lightening sitting may lift; a bigger change is split over more sittings. Common practice: 3 on virgin, healthy hair, 2 on previously
          coloured hair, 1 on compromised hair; a fragile strand test takes one level more off.
        </p>
        <div className="grid gap-4 md:grid-cols-3">
          {HAIR_STATES.map((state) => (
            <TextField
              key={state}
              label={`Levels a sitting, ${hairStateNames[state]} hair (at most ${MAX_LIFT_PER_SITTING})`}
              type="number"
              inputMode="numeric"
              error={err(`liftPerSitting.${state}`)}
              {...form.register(`liftPerSitting.${state}`, num)}
            />
          ))}
        </div>
      </div>
    </SectionCard>
  );
}
