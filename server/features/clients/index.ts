// The clients feature's public module: other features import it only from here.
export { findClient, findClientIdForUser, insertClient, setSmsStopped, updateClientContact } from './clients.repository';
