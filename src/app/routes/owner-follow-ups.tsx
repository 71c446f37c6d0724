import { useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Button } from '@client/components/ui/button';
import { ConfirmRemove } from '@client/components/ui/confirm-remove';
import { PageHeader } from '@client/components/ui/page-header';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { SectionCard } from '@client/components/ui/section-card';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { followUpQueries, useRemoveFollowUpRule } from '@client/features/follow-ups/api/follow-up-queries';
import { FollowUpRuleForm } from '@client/features/follow-ups/components/follow-up-rule-form';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';
import { toastDone } from '@client/lib/toast';
import { describeFollowUpRule } from '@shared/messages/follow-up-timing';

export async function loader() {
  await Promise.all([
    queryClient.ensureQueryData(followUpQueries.list()),
    queryClient.ensureQueryData(catalogueQueries.services()),
    queryClient.ensureQueryData(salonQueries.current()),
  ]);
  return null;
}

export function Component() {
  const { data } = useSuspenseQuery(followUpQueries.list());
  const { data: catalogue } = useSuspenseQuery(catalogueQueries.services());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const remove = useRemoveFollowUpRule();
  const [editing, setEditing] = useState<string | null>(null);
  const [formKey, setFormKey] = useState(0);
  const editingRule = data.rules.find((r) => r.id === editing) ?? null;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Set-up"
        subtitle="Follow-up rules: suggestions sent some time after a service, e.g. a toner refresh six weeks after lightening. Only clients who said yes to suggestions get them."
      />
      <SetupNav />
      <div className="grid gap-6 lg:grid-cols-2">
        <SectionCard title="Rules">
          {data.rules.length === 0 ? (
            <p>No follow-up rules yet.</p>
          ) : (
            <ul className="flex flex-col gap-4">
              {data.rules.map((r) => (
                <li key={r.id} className="flex flex-col gap-1 border-b border-ink/10 pb-3">
                  <p className="font-bold">
                    {r.title} <span className="font-normal">after {r.serviceName}</span>
                  </p>
                  <p className="whitespace-pre-line">{r.text}</p>
                  <p className="text-sm">Sent {describeFollowUpRule(r.rrule) ?? <code title="Calendar rule (RFC 5545)">{r.rrule}</code>}</p>
                  <div className="flex gap-3">
                    <Button variant="secondary" onClick={() => setEditing(r.id)} aria-label={`Edit ${r.title}`}>
                      Edit
                    </Button>
                    <ConfirmRemove
                      what={`the rule “${r.title}”`}
                      busy={remove.isPending && remove.variables === r.id}
                      onRemove={() => remove.mutate(r.id, { onSuccess: () => toastDone(`Removed the rule “${r.title}”.`) })}
                    />
                  </div>
                </li>
              ))}
            </ul>
          )}
        </SectionCard>
        <SectionCard title={editingRule ? `Edit “${editingRule.title}”` : 'New rule'}>
          <FollowUpRuleForm
            key={editingRule ? `${editingRule.id}-${editingRule.version}` : `new-${formKey}`}
            rule={editingRule}
            services={catalogue.services}
            timeZone={salon.timeZone}
            onDone={() => {
              setEditing(null);
              setFormKey((k) => k + 1);
            }}
          />
        </SectionCard>
      </div>
    </div>
  );
}
