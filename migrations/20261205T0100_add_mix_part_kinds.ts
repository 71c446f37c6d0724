import { sql, type Kysely } from 'kysely';

// Each weighed part of a bowl says what it is (a product type, developer, or other), so a bowl of 30 g
// lightener and 60 g developer counts and costs as exactly those parts; developer gets its own cost per gram.
//
// Parts written before this had only a free-text name. They are read as: developer-like words → developer;
// water, cream or conditioner → other; the name of a product type (or its label) → that type; anything else
// → the bowl's own product type, which is what the totals assumed until now.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table product_costs drop constraint product_costs_product_type_check;
    alter table product_costs add constraint product_costs_product_type_check check (product_type in
      ('lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder', 'developer'));

    update mix_logs m set grams = coalesce((
      select jsonb_agg(p || jsonb_build_object('kind', case
          when lower(p->>'part') ~ '(develop|peroxide|oxid|activator|\\mvol\\M)' then 'developer'
          when lower(p->>'part') ~ '\\m(water|cream|conditioner|diluent)\\M' then 'other'
          when lower(trim(p->>'part')) in ('lightener', 'bleach', 'powder') then 'lightener'
          when lower(trim(p->>'part')) in ('remover', 'colour remover', 'color remover') then 'remover'
          when lower(trim(p->>'part')) in ('permanent', 'permanent colour', 'permanent color') then 'permanent'
          when lower(trim(p->>'part')) in ('demi_permanent', 'demi-permanent', 'demi-permanent colour', 'demi-permanent color') then 'demi_permanent'
          when lower(trim(p->>'part')) in ('direct_dye', 'direct dye') then 'direct_dye'
          when lower(trim(p->>'part')) = 'toner' then 'toner'
          when lower(trim(p->>'part')) in ('bond_builder', 'bond builder') then 'bond_builder'
          else m.product_type
        end) order by e.ord)
      from jsonb_array_elements(m.grams) with ordinality as e(p, ord)
    ), '[]'::jsonb);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    update mix_logs m set grams = coalesce((
      select jsonb_agg(p - 'kind' order by e.ord) from jsonb_array_elements(m.grams) with ordinality as e(p, ord)
    ), '[]'::jsonb);
    delete from product_costs where product_type = 'developer';
    alter table product_costs drop constraint product_costs_product_type_check;
    alter table product_costs add constraint product_costs_product_type_check check (product_type in
      ('lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder'));
  `.execute(db);
}
