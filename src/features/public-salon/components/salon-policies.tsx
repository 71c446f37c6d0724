import type { PublicSalon } from '@shared/schemas/online-booking.schemas';
import { SectionCard } from '@client/components/ui/section-card';

type Props = { policies: PublicSalon['policies'] };

/** The salon's terms in its own words, and the chemical cautions every colour client should know. */
export function SalonPolicies({ policies }: Props) {
  const rows = [
    { term: 'Deposit', text: policies.deposit },
    { term: 'Cancellation', text: policies.cancellation },
    { term: 'Lateness', text: policies.lateness },
    { term: 'Skin test', text: policies.skinTest },
  ];
  return (
    <SectionCard title="Policies">
      <dl className="flex flex-col gap-3">
        {rows.map((row) => (
          <div key={row.term}>
            <dt className="font-bold">{row.term}</dt>
            <dd>{row.text}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-4 text-sm">
        Hair colour and lightener can irritate or burn skin and scalp, cause allergic reactions and damage hair. Tell the salon about past reactions, allergies
        and colour done at home. The salon follows local regulations and the judgement of its licensed professionals.
      </p>
    </SectionCard>
  );
}
