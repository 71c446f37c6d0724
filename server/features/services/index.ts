// The services feature's public module: other features import it only from here.
export { findService, listServices, listStylistDetails, toSummary } from './services.repository';
