// The test records feature's public module: other features import it only from here.
export { storeTestRecord } from './store-test-record.service';
