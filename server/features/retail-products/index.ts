// The retail products feature's public module: other features import it only from here.
// Checkout takes what it sells from the stock with takeFromStock, inside its own transaction.
export { listRetailProducts, takeFromStock } from './retail-products.repository';
