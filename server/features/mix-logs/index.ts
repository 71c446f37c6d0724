// The mix logs feature's public module: other features import it only from here.
export { checkSalonStrength } from './mix-logs.service';
