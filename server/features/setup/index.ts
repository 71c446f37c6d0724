// The setup feature's public module: other features import it only from here.
export { salonStaffNames } from './staff-setup.repository';
