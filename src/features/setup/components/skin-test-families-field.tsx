import { Controller, type Control } from 'react-hook-form';
import type { SalonSettingsInput } from '@shared/schemas/salon-settings.schemas';
import { ALWAYS_TESTED, productFamilyLabels, WIDENING_FAMILIES, type WideningFamily } from '@shared/rules/skin-test-need';

/**
 * Which product families need a skin test in this salon. Oxidative colour and oxidative toner always do (shown
 * ticked and fixed); the salon may add others (many test before lightener too), never take those two away.
 */
export function SkinTestFamiliesField({ control }: { control: Control<SalonSettingsInput> }) {
  return (
    <Controller
      control={control}
      name="skinTestFamilies"
      render={({ field }) => {
        const chosen = new Set<WideningFamily>(field.value ?? []);
        const toggle = (family: WideningFamily) => {
          if (chosen.has(family)) chosen.delete(family);
          else chosen.add(family);
          field.onChange(WIDENING_FAMILIES.filter((f) => chosen.has(f)));
        };
        return (
          <fieldset className="flex flex-col gap-2 md:col-span-2">
            <legend className="mb-1 font-bold">Steps that need a skin test first</legend>
            <p className="text-sm text-ink/80">
              A booking needs a skin test when any of its steps puts one of these on the hair, whatever service it is booked under.
            </p>
            <div className="flex flex-wrap gap-x-5 gap-y-2">
              {ALWAYS_TESTED.map((family) => (
                <label key={family} className="inline-flex min-h-11 items-center gap-2">
                  <input type="checkbox" className="size-5" checked disabled aria-describedby="always-tested-note" />
                  {productFamilyLabels[family]}
                </label>
              ))}
              {WIDENING_FAMILIES.map((family) => (
                <label key={family} className="inline-flex min-h-11 items-center gap-2">
                  <input type="checkbox" className="size-5 accent-oxide" checked={chosen.has(family)} onChange={() => toggle(family)} onBlur={field.onBlur} />
                  {productFamilyLabels[family]}
                </label>
              ))}
            </div>
            <p id="always-tested-note" className="text-sm text-ink/80">
              Oxidative colour and toner always need one: their labels warn of severe allergic reactions. Follow your local regulations and the product maker’s
              instructions.
            </p>
          </fieldset>
        );
      }}
    />
  );
}
