// The salon feature's public module: other features import it only from here.
export { salonQueries } from './api/salon-queries';
