// The standby feature's public module: other features import it only from here.
export { closeStandby, listStandby } from './standby.repository';
