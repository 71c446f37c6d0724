// The auth feature's public module: other features import it only from here.
export { sessionQueries } from './api/session-queries';
