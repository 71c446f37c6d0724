// The salon feature's public module: other features import it only from here.
export { salonQueries } from './api/salon-queries';
export { usePhoneText } from './use-phone-text';
