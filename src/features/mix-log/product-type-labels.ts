import { MixPartKindSchema, type CostedProduct, type MixPartKind, type ProductType } from '@shared/schemas/mix-log.schemas';

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

/** What the owner can price in Set-up → Quote prices: the product types and developer. */
export const costedProductLabels: Record<CostedProduct, string> = { ...productTypeLabels, developer: 'Developer' };

/** What a weighed part of a bowl can be. */
export const partKindLabels: Record<MixPartKind, string> = { ...costedProductLabels, other: 'Other (water, cream, additive)' };

export const partKindOptions = MixPartKindSchema.options.map((value) => ({ value, label: partKindLabels[value] }));
