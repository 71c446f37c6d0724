// The audit feature's public module: other features import it only from here.
export { listAudit, writeAudit } from './audit.repository';
