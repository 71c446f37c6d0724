// The consultations feature's public module: other features import it only from here.
export { clientPhotoIds, findClientQuote } from './consultations.repository';
