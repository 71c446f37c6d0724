// The windows feature's public module: other features import it only from here.
export { withdrawStaleOffers } from './offer-withdrawal.service';
