// The mix log feature's public module: other features import it only from here.
export { costedProductLabels, productTypeLabels, productTypeOptions } from './product-type-labels';
