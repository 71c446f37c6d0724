// The hair history feature's public module: other features import it only from here.
export { findHairHistory } from './hair-history.repository';
