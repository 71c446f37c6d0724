import { Controller, useFormContext } from 'react-hook-form';
import type { SalonSettings, SalonSettingsInput } from '@shared/schemas/salon-settings.schemas';
import { parsePercent, percentText } from '@shared/money/percent';
import { ConvertedField } from '@client/components/ui/converted-field';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { fieldError } from '@client/lib/form-errors';

/** Set-up → Salon: the tax rate checkout applies once per receipt, and whether prices already include it. */
export function TaxFields() {
  const form = useFormContext<SalonSettingsInput, unknown, SalonSettings>();
  const err = (name: string) => fieldError(form.formState.errors, name);
  return (
    <SectionCard title="Tax at checkout">
      {/* One column that never grows past the card on a phone: the select's longest choice is wider than 375 px. */}
      <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
        <ConvertedField
          control={form.control}
          name="taxRateMilliPercent"
          label="Tax rate (%)"
          hint="Up to three decimals, e.g. 8.25; 0 for none; at most 50."
          inputMode="decimal"
          className="max-w-xs"
          error={err('taxRateMilliPercent')}
          format={(value) => (typeof value === 'number' && Number.isFinite(value) ? percentText(value) : '')}
          // Text that is not a number stays in the form as NaN, so the schema says so rather than leaving the rate unchanged.
          parse={(text) => parsePercent(text) ?? Number.NaN}
        />
        <Controller
          control={form.control}
          name="taxInclusive"
          render={({ field }) => (
            <SelectField
              label="Prices on the menu and the product list"
              options={[
                { value: 'exclusive', label: 'Do not include tax: checkout adds it' },
                { value: 'inclusive', label: 'Include tax: checkout shows the tax inside them' },
              ]}
              name={field.name}
              ref={field.ref}
              value={field.value ? 'inclusive' : 'exclusive'}
              onBlur={field.onBlur}
              onChange={(e) => field.onChange(e.target.value === 'inclusive')}
            />
          )}
        />
        <p className="text-sm text-ink/80 md:col-span-2">
          Checkout works tax out once on the whole receipt, after any discount, and rounds it to the nearest cent (or the currency’s smallest unit), a half
          going up.
        </p>
      </div>
    </SectionCard>
  );
}
