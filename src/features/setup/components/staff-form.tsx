import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { StaffInviteSchema, type StaffInvite, type StaffMember } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { useInviteStaff, useSaveStaff } from '../api/setup-mutations';
import { HoursLines } from './hours-lines';

type Props = { member: StaffMember | null; skills: string[]; timeZone: string; onDone: (message: string) => void };

const roles = [
  { value: 'stylist', label: 'Stylist (takes clients)' },
  { value: 'front_desk', label: 'Front desk' },
  { value: 'owner', label: 'Owner' },
];
const fieldNames = ['email', 'details.name', 'details.role', 'details.skills', 'details.maxClientsAtOnce', 'details.hours'] as const;

const blank: StaffInvite = {
  email: '',
  details: { name: '', role: 'stylist', skills: [], maxClientsAtOnce: 2, hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:00' }] },
};

/** Invite a new member of staff (they get an e-mail link to choose a password), or change one. */
export function StaffForm({ member, skills, timeZone, onDone }: Props) {
  const invite = useInviteStaff();
  const saveStaff = useSaveStaff();
  const [extraSkill, setExtraSkill] = useState('');
  const form = useForm<StaffInvite>({
    resolver: zodResolver(StaffInviteSchema),
    defaultValues: member ? { email: member.email, details: member.details } : blank,
  });
  const { errors } = form.formState;
  const err = (name: string) => fieldError(errors, name);
  const role = form.watch('details.role');
  const chosen = form.watch('details.skills');
  const allSkills = [...new Set([...skills, ...chosen])].sort();
  const submit = form.handleSubmit((body) => {
    const done = member
      ? saveStaff.mutateAsync({ id: member.id, body: body.details }).then(() => onDone(`${body.details.name} is saved.`))
      : invite
          .mutateAsync(body)
          .then(() => onDone(`${body.details.name} is invited: an e-mail with a link to choose a password is on its way to ${body.email}.`));
    return done.catch((error) => showServerErrors(error, form.setError, fieldNames));
  });
  return (
    <FormProvider {...form}>
      <form aria-label={member ? `Change ${member.details.name}` : 'Invite a member of staff'} noValidate onSubmit={submit} className="flex flex-col gap-4">
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        <div className="grid gap-4 md:grid-cols-2">
          <TextField label="Name" error={err('details.name')} {...form.register('details.name')} />
          <TextField label="E-mail" type="email" disabled={Boolean(member)} error={err('email')} {...form.register('email')} />
          <SelectField label="Role" options={roles} error={err('details.role')} {...form.register('details.role')} />
          {role === 'stylist' && (
            <TextField
              label="Clients at once (at most)"
              hint="Developing clients they can look after together"
              type="number"
              error={err('details.maxClientsAtOnce')}
              {...form.register('details.maxClientsAtOnce', { valueAsNumber: true })}
            />
          )}
        </div>
        {role === 'stylist' && (
          <>
            <fieldset className="flex flex-col gap-2">
              <legend className="font-bold">Skills</legend>
              <div className="flex flex-wrap gap-4">
                {allSkills.map((skill) => (
                  <label key={skill} className="flex min-h-11 items-center gap-2">
                    <input
                      type="checkbox"
                      className="size-5"
                      checked={chosen.includes(skill)}
                      onChange={(e) =>
                        form.setValue('details.skills', e.target.checked ? [...chosen, skill] : chosen.filter((s) => s !== skill), { shouldDirty: true })
                      }
                    />{' '}
                    {skill}
                  </label>
                ))}
              </div>
              <div className="flex flex-wrap items-end gap-2">
                <TextField label="Another skill" value={extraSkill} onChange={(e) => setExtraSkill(e.target.value)} />
                <Button
                  variant="secondary"
                  disabled={!extraSkill.trim()}
                  onClick={() => {
                    form.setValue('details.skills', [...new Set([...chosen, extraSkill.trim()])]);
                    setExtraSkill('');
                  }}
                >
                  Add skill
                </Button>
              </div>
              {err('details.skills') && <p className="text-sm font-bold text-brick">{err('details.skills')}</p>}
            </fieldset>
            <div className="flex flex-col gap-2">
              <h3 className="font-bold">Working hours</h3>
              <HoursLines name="details.hours" timeZone={timeZone} />
            </div>
          </>
        )}
        <div>
          <Button type="submit" busy={invite.isPending || saveStaff.isPending}>
            {member ? 'Save' : 'Send the invitation'}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
