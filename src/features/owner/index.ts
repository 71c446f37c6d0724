// The owner feature's public module: other features import it only from here.
export { StatTile } from './components/stat-tile';
