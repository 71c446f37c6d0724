import { zodResolver } from '@hookform/resolvers/zod';
import { getCountries } from 'libphonenumber-js';
import { Controller, FormProvider, useForm } from 'react-hook-form';
import { SalonSettingsSchema, type SalonSettings, type SalonSettingsInput } from '@shared/schemas/salon-settings.schemas';
import { countryName } from '@shared/schemas/contact.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { toastDone } from '@client/lib/toast';
import { useSaveSalonSettings } from '../api/setup-mutations';
import { HoursLines } from './hours-lines';
import { SkinTestFamiliesField } from './skin-test-families-field';
import { PlanningRulesFields } from './planning-rules-fields';
import { TaxFields } from './tax-fields';

const zones = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
// Every country libphonenumber-js can read numbers for, by name.
const countries = getCountries()
  .map((code) => ({ value: code, label: `${countryName(code)} (${code})` }))
  .sort((a, b) => a.label.localeCompare(b.label));
const fieldNames = [
  'name',
  'address',
  'phone',
  'timeZone',
  'currency',
  'country',
  'hours',
  'skinTestLeadHours',
  'skinTestValidityDays',
  'skinTestFamilies',
  'holdMinutes',
  'cancellationWindowHours',
  'noShowGraceMinutes',
  'unpaidDepositReleaseHours',
  'lateStartLimitMinutes',
  'quietFrom',
  'quietTo',
  'reminderOffsetsHours',
  'maxDeveloperPercent',
  'taxRateMilliPercent',
  'taxInclusive',
  'processingLimits.lightener',
  'processingLimits.oxidative_colour',
  'processingLimits.toner_oxidative',
  'processingLimits.colour_remover',
  'liftPerSitting.virgin',
  'liftPerSitting.coloured',
  'liftPerSitting.compromised',
] as const;

/** Everything about how the salon works, in one form checked by the same schema as the server. */
export function SalonSettingsForm({ settings }: { settings: SalonSettings }) {
  const save = useSaveSalonSettings();
  const form = useForm<SalonSettingsInput, unknown, SalonSettings>({ resolver: zodResolver(SalonSettingsSchema), defaultValues: settings });
  const { errors } = form.formState;
  const err = (name: string) => fieldError(errors, name);
  const num = { valueAsNumber: true } as const;
  const submit = form.handleSubmit((body) =>
    save.mutateAsync(body).then(
      (next) => {
        form.reset(next);
        // A toast, beside the Save button at the foot of a long form, rather than a note at its top.
        toastDone('The salon settings are saved. New bookings follow them from now on.');
      },
      (error) => showServerErrors(error, form.setError, fieldNames),
    ),
  );
  const zone = form.watch('timeZone');
  return (
    <FormProvider {...form}>
      <form aria-label="Salon settings" noValidate onSubmit={submit} className="flex flex-col gap-6">
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        <SectionCard title="The salon">
          <div className="grid gap-4 md:grid-cols-2">
            <TextField label="Name" error={err('name')} {...form.register('name')} />
            <TextField label="Phone" error={err('phone')} {...form.register('phone')} />
            <TextField label="Address" className="md:col-span-2" error={err('address')} {...form.register('address')} />
            <TextField
              label="Time zone"
              hint="Pick the salon's city, e.g. America/Denver (names from the IANA time-zone database)"
              list="setup-time-zones"
              error={err('timeZone')}
              {...form.register('timeZone')}
            />
            <datalist id="setup-time-zones">
              {zones.map((z) => (
                <option key={z} value={z} />
              ))}
            </datalist>
            <TextField
              label="Currency"
              hint="Three letters, e.g. USD or EUR (ISO 4217)"
              className="w-40"
              error={err('currency')}
              {...form.register('currency', { setValueAs: (v: string) => v.toUpperCase() })}
            />
            <SelectField
              label="Country"
              hint="Phone numbers typed without a country code are read as this country's"
              options={countries}
              error={err('country')}
              {...form.register('country')}
            />
          </div>
        </SectionCard>
        <SectionCard title="Opening hours">
          <HoursLines name="hours" timeZone={zone || settings.timeZone} />
        </SectionCard>
        <SectionCard title="Bookings, deposits and cancelling">
          <div className="grid gap-4 md:grid-cols-2">
            <TextField
              label="Skin test at least this many hours before colour"
              hint="At least 48: the test is applied, then read 48 hours later, before the appointment."
              type="number"
              error={err('skinTestLeadHours')}
              {...form.register('skinTestLeadHours', num)}
            />
            <TextField
              label="A negative skin test stays valid for (days)"
              hint="182 days (about six months) is common practice. Product makers ask for a test before every colouring; your local rules may ask for more."
              type="number"
              error={err('skinTestValidityDays')}
              {...form.register('skinTestValidityDays', num)}
            />
            <SkinTestFamiliesField control={form.control} />
            <TextField label="Online hold lasts (minutes)" type="number" error={err('holdMinutes')} {...form.register('holdMinutes', num)} />
            <TextField
              label="Cancellation window (hours before the first sitting)"
              type="number"
              error={err('cancellationWindowHours')}
              {...form.register('cancellationWindowHours', num)}
            />
            <SelectField
              label="A cancellation inside the window keeps"
              options={[
                { value: 'deposit', label: 'The deposit' },
                { value: 'nothing', label: 'Nothing: the deposit is always refunded' },
              ]}
              {...form.register('cancellationKeeps')}
            />
            <TextField
              label="No-show grace (minutes after the planned start)"
              hint="The desk can mark a no-show once this long has passed; the deposit policy above applies."
              type="number"
              error={err('noShowGraceMinutes')}
              {...form.register('noShowGraceMinutes', num)}
            />
            <TextField
              label="Release unpaid desk bookings after (hours)"
              hint="A booking made at the desk whose deposit is still unpaid this long after it was made is released. Leave empty: an unpaid deposit does not release the booking."
              type="number"
              error={err('unpaidDepositReleaseHours')}
              {...form.register('unpaidDepositReleaseHours', { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v)) })}
            />
            <TextField
              label="Late start allowed (minutes)"
              hint="When a sitting runs over, the desk may start the next client up to this late (and tell them) before moving them."
              type="number"
              error={err('lateStartLimitMinutes')}
              {...form.register('lateStartLimitMinutes', num)}
            />
            <p className="self-end text-sm text-ink/80">Each service sets its own deposit (fixed or a share of the price) on the Services page.</p>
          </div>
        </SectionCard>
        <TaxFields />
        <SectionCard title="Messages">
          <div className="grid gap-4 md:grid-cols-3">
            <TextField label="No text messages from" type="time" error={err('quietFrom')} {...form.register('quietFrom')} />
            <TextField label="Until" type="time" error={err('quietTo')} {...form.register('quietTo')} />
            <Controller
              control={form.control}
              name="reminderOffsetsHours"
              render={({ field }) => (
                <TextField
                  label="Reminders, hours before"
                  hint="Up to four, separated by commas, e.g. 48, 24"
                  error={err('reminderOffsetsHours') ?? err('reminderOffsetsHours.0')}
                  defaultValue={field.value.join(', ')}
                  onBlur={field.onBlur}
                  onChange={(e) =>
                    field.onChange(
                      e.target.value
                        .split(',')
                        .map((p) => p.trim())
                        .filter(Boolean)
                        .map(Number),
                    )
                  }
                />
              )}
            />
          </div>
        </SectionCard>
        <SectionCard title="Colour safety">
          <TextField
            label="Highest developer strength allowed (% hydrogen peroxide)"
            hint="EU Regulation 1223/2009, Annex III allows at most 12 % in hair products; follow your local regulations and licensed practice."
            type="number"
            step="0.1"
            className="max-w-md"
            error={err('maxDeveloperPercent')}
            {...form.register('maxDeveloperPercent', num)}
          />
        </SectionCard>
        <PlanningRulesFields />
        <div>
          <Button type="submit" busy={save.isPending}>
            Save salon settings
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
