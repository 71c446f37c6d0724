// The clients feature's public module: other features import it only from here.
export { ClientPicker } from './components/client-picker';
