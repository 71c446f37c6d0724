import { zodResolver } from '@hookform/resolvers/zod';
import { useSuspenseQuery } from '@tanstack/react-query';
import { FormProvider, useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { ServiceInputSchema, type ServiceFormInput, type ServiceInput } from '@shared/schemas/setup.schemas';
import { withinProcessingLimits } from '@shared/rules/processing-limits';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { paths } from '@client/config/paths';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { toastDone } from '@client/lib/toast';
import { StepPlanEditor } from '@client/features/bookings';
import { typicalMinutesNotes, useTypicalMinutes } from '@client/features/typical-minutes';
import { useRetireService, useSaveService } from '../api/setup-mutations';
import { salonQueries } from '@client/features/salon';
import { MoneyField } from '@client/components/ui/money-field';
import type { ProductFamily, StepPlan } from '@shared/schemas/step-plan.schemas';
import { productFamilyLabels, stepNeedingSkinTest } from '@shared/rules/skin-test-need';

type Props = { id: string | null; initial: ServiceFormInput; skills: string[]; currency: string; active: boolean; families: readonly ProductFamily[] };

const categories = [
  { value: 'colour', label: 'Colour' },
  { value: 'cut', label: 'Cut' },
  { value: 'treatment', label: 'Treatment' },
  { value: 'consultation', label: 'Consultation' },
  { value: 'skin_test', label: 'Skin test' },
];
const fieldNames = ['name', 'description', 'category', 'skill', 'priceCents', 'depositCents', 'depositPercent', 'stepPlan'] as const;

/** A service on the menu: what it is, what it costs and takes as deposit, and its step plan. */
export function ServiceForm({ id, initial, skills, currency, active, families }: Props) {
  const save = useSaveService();
  const retire = useRetireService();
  const navigate = useNavigate();
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  // The service's plan is held to the salon's processing limits, as the server holds it.
  const schema = ServiceInputSchema.superRefine(withinProcessingLimits(salon.processingLimits));
  const form = useForm<ServiceFormInput, unknown, ServiceInput>({ resolver: zodResolver(schema), defaultValues: initial });
  // How long each step really took, beside its planned minutes: a suggestion the owner takes with "Use", never by itself.
  const typical = useTypicalMinutes(id);
  const { errors } = form.formState;
  const err = (name: string) => fieldError(errors, name);
  const depositKind = form.watch('depositKind');
  const plan = form.watch('stepPlan');
  const stepNeeding = stepNeedingSkinTest(
    { sittings: plan.sittings.map((s) => ({ ...s, steps: s.steps.filter((st) => Boolean(st.product)) })) } as StepPlan,
    families,
  );
  const submit = form.handleSubmit((body) =>
    save.mutateAsync({ id, body }).then(
      (saved) => {
        toastDone(`${saved.name} is saved.`);
        navigate(paths.ownerSetupServices);
      },
      (error) => showServerErrors(error, form.setError, fieldNames),
    ),
  );
  return (
    <FormProvider {...form}>
      <form aria-label="Service" noValidate onSubmit={submit} className="flex flex-col gap-6">
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        {retire.isError && <FormAlert>{retire.error.message}</FormAlert>}
        <SectionCard title="The service">
          <div className="grid gap-4 md:grid-cols-2">
            <TextField label="Name" error={err('name')} {...form.register('name')} />
            <SelectField label="Kind of service" options={categories} error={err('category')} {...form.register('category')} />
            <TextAreaField label="Description" className="md:col-span-2" error={err('description')} {...form.register('description')} />
            <TextField label="Skill needed" hint="Stylists with this skill can take it" list="setup-skills" error={err('skill')} {...form.register('skill')} />
            <datalist id="setup-skills">
              {skills.map((s) => (
                <option key={s} value={s} />
              ))}
            </datalist>
            <div className="flex flex-col gap-2 self-end">
              <label className="flex min-h-11 items-center gap-2">
                <input type="checkbox" className="size-5" {...form.register('onlineBookable')} /> Clients may book it online
              </label>
              <label className="flex min-h-11 items-center gap-2">
                <input type="checkbox" className="size-5" aria-describedby="service-skin-test-note" {...form.register('needsSkinTest')} /> Also ask for a skin
                test for this service
              </label>
              <p id="service-skin-test-note" className="text-sm text-ink/80">
                {stepNeeding
                  ? `The steps already need one: step ${stepNeeding.step}${stepNeeding.sitting > 1 ? ` of sitting ${stepNeeding.sitting}` : ''} (${stepNeeding.label}) puts ${productFamilyLabels[stepNeeding.product].toLowerCase()} on the hair.`
                  : 'No step needs one now; a step with oxidative colour or toner will, whatever this box says.'}
              </p>
            </div>
          </div>
        </SectionCard>
        <SectionCard title="Price and deposit">
          <div className="grid gap-4 md:grid-cols-3">
            <MoneyField control={form.control} name="priceCents" label="Price" currency={currency} error={err('priceCents')} />
            <label className="flex min-h-11 items-center gap-2 self-end">
              <input type="checkbox" className="size-5" {...form.register('priceIsFrom')} /> Price is a starting price (“from”)
            </label>
            <span />
            <SelectField
              label="Deposit"
              options={[
                { value: 'fixed', label: 'A fixed amount' },
                { value: 'percent', label: 'A share of the price' },
              ]}
              {...form.register('depositKind')}
            />
            {depositKind === 'percent' ? (
              <TextField
                label="Deposit (% of the price)"
                type="number"
                step="1"
                error={err('depositPercent')}
                {...form.register('depositPercent', { setValueAs: (v: string | number | null) => (v === '' || v === null ? null : Number(v)) })}
              />
            ) : (
              <MoneyField
                control={form.control}
                name="depositCents"
                label="Deposit amount"
                currency={currency}
                hint="0 for no deposit"
                error={err('depositCents')}
              />
            )}
          </div>
        </SectionCard>
        <StepPlanEditor title="Step plan" editSittings defaultOpen {...typicalMinutesNotes(typical)} />
        {err('stepPlan.sittings') && <p className="font-bold text-brick">{err('stepPlan.sittings')}</p>}
        <div className="flex flex-wrap gap-3">
          <Button type="submit" busy={save.isPending}>
            {id ? 'Save the service' : 'Add the service'}
          </Button>
          {id && active && (
            <Button
              variant="secondary"
              busy={retire.isPending}
              onClick={() =>
                retire.mutate(id, {
                  onSuccess: () => {
                    toastDone('Taken off the menu. Bookings already made keep it.');
                    navigate(paths.ownerSetupServices);
                  },
                })
              }
            >
              Take off the menu
            </Button>
          )}
        </div>
      </form>
    </FormProvider>
  );
}
