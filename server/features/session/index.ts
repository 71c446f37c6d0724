// The session feature's public module: other features import it only from here.
export { findUserByEmail, setPassword, userName } from './users.repository';
