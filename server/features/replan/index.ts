// The replan feature's public module: other features import it only from here.
export { replanAfterTap } from './replan-summary.service';
