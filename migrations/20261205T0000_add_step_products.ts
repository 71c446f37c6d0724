import { sql, type Kysely } from 'kysely';

// Every step of every stored step plan (services, bookings, quotes) names what it puts on the hair, so whether a
// booking needs a skin test follows from its steps. Stored plans get the family their labels say; an application
// step passes its family to the developing step after it ("Colour develops" after "Apply colour"). Colour words
// read as oxidative colour and toner words as oxidative toner: when in doubt the rule asks for a skin test.
// Frozen in time: this logic is the migration's own, not the app's.

type Step = { kind: string; label: string; product?: string };
type Plan = { sittings: { steps: Step[] }[] };

function familyOf(label: string): string | null {
  const l = label.toLowerCase();
  if (/rinse|shampoo|wash|blow-?dry|cut|trim|finish|consult|check-in|style/.test(l) && !/bond|treatment/.test(l)) return 'none';
  if (/remov/.test(l)) return 'colour_remover';
  if (/lighten|bleach|lift|balayage|foil|highlight/.test(l)) return 'lightener';
  if (/vivid|direct|semi/.test(l)) return 'direct_dye';
  if (/toner|tone|gloss/.test(l)) return 'toner_oxidative';
  if (/bond|treatment|care|mask/.test(l)) return 'bond_care';
  if (/colou?r|tint|root|grey|gray|filler|pigment|dye/.test(l)) return 'oxidative_colour';
  return null;
}

function withProducts(plan: Plan): Plan {
  return {
    ...plan,
    sittings: plan.sittings.map((sitting) => {
      let carried = 'none';
      return {
        ...sitting,
        steps: sitting.steps.map((step) => {
          if (step.product) return step;
          const found = familyOf(step.label);
          const product = found ?? (step.kind === 'developing' ? carried : 'none');
          if (step.kind === 'hands_on') carried = product;
          return { ...step, product };
        }),
      };
    }),
  };
}

export async function up(db: Kysely<any>): Promise<void> {
  for (const table of ['services', 'bookings', 'quotes']) {
    const rows = await db.selectFrom(table).select(['id', 'step_plan']).execute();
    for (const row of rows) {
      await db.updateTable(table).set({ step_plan: JSON.stringify(withProducts(row.step_plan as Plan)) }).where('id', '=', row.id).execute();
    }
  }
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['services', 'bookings', 'quotes']) {
    await sql`update ${sql.table(table)} set step_plan = jsonb_set(step_plan, '{sittings}', (
      select coalesce(jsonb_agg(jsonb_set(s, '{steps}', (select coalesce(jsonb_agg(st - 'product'), '[]'::jsonb) from jsonb_array_elements(s->'steps') st))), '[]'::jsonb)
      from jsonb_array_elements(step_plan->'sittings') s))`.execute(db);
  }
}
