import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormAlert } from '@client/components/ui/form-alert';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { setupQueries } from '@client/features/setup/api/setup-queries';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { StaffForm } from '@client/features/setup/components/staff-form';
import { StaffLeavingPanel } from '@client/features/setup/components/staff-leaving-panel';
import { StaffTable } from '@client/features/setup/components/staff-table';
import { TimeOffPanel } from '@client/features/setup/components/time-off-panel';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await Promise.all([
    queryClient.ensureQueryData(setupQueries.staff()),
    queryClient.ensureQueryData(setupQueries.services()),
    queryClient.ensureQueryData(salonQueries.current()),
  ]);
  return null;
}

export function Component() {
  const { data } = useSuspenseQuery(setupQueries.staff());
  const { data: services } = useSuspenseQuery(setupQueries.services());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const [pickedId, setPickedId] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const picked = data.staff.find((m) => m.id === pickedId) ?? null;
  const done = (message: string) => {
    setNotice(message);
    setPickedId(null);
  };
  return (
    <div className="flex flex-col gap-6">
      <div>
        <PageHeader title="Set-up" subtitle="Who works here, what they do, and when." />
        <SetupNav />
      </div>
      {notice && <FormAlert tone="success">{notice}</FormAlert>}
      <StaffTable
        staff={data.staff}
        onPick={(m) => {
          setNotice(null);
          setPickedId(m.id);
        }}
      />
      {picked && (
        <>
          <SectionCard title={`Change ${picked.details.name}`}>
            <StaffForm key={picked.id} member={picked} skills={services.skills} timeZone={salon.timeZone} onDone={done} />
          </SectionCard>
          {picked.staffId && (
            <SectionCard title={`Time off: ${picked.details.name}`}>
              <TimeOffPanel member={picked} timeZone={salon.timeZone} />
            </SectionCard>
          )}
          {picked.active && (
            <SectionCard title={`Deactivate ${picked.details.name}`}>
              <StaffLeavingPanel member={picked} timeZone={salon.timeZone} onDone={done} />
            </SectionCard>
          )}
        </>
      )}
      <SectionCard title="Invite a member of staff">
        <StaffForm key={notice ?? 'invite'} member={null} skills={services.skills} timeZone={salon.timeZone} onDone={done} />
      </SectionCard>
    </div>
  );
}
