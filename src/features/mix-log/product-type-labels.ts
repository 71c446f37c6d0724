import type { ProductType } from '../../../shared/schemas/mix-log.schemas';

/** Plain trade words for the generic product types (never brand names). */
export const productTypeLabels: Record<ProductType, string> = {
  lightener: 'Lightener',
  remover: 'Colour remover',
  permanent: 'Permanent colour',
  demi_permanent: 'Demi-permanent colour',
  direct_dye: 'Direct dye',
  toner: 'Toner',
  bond_builder: 'Bond builder',
};

export const productTypeOptions = (Object.keys(productTypeLabels) as ProductType[]).map((value) => ({ value, label: productTypeLabels[value] }));
