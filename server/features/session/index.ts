// The session feature's public module: other features import it only from here.
export { findSessionUser, findUserByEmail, setPassword, userName } from './users.repository';
export { signIn } from './session.service';
