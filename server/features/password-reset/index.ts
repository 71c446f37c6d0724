// The password reset feature's public module: other features import it only from here.
export { issuePasswordToken } from './password-reset.service';
export { deleteSessionsOfUser } from './password-resets.repository';
