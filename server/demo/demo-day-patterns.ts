// Hand-placed days for the demo book. Each placement names the stylist, chair, basin, service, start time
// and how long each developing step runs; window fits sit inside another client's developing time.
// They were laid out so no chair, basin or stylist's hands overlap (the database would refuse it).
import type { ServiceKey, StylistKey } from './demo-catalogue';

export interface Placement {
  stylist: StylistKey;
  chair: number; // index into demoSalon.chairs
  basin: number; // index into demoSalon.basins, for every basin step of the placement
  service: ServiceKey;
  sitting?: number; // which sitting of the service (0-based); default 0
  start: string; // local HH:MM
  developing: number[]; // minutes for each developing step, in order
  /** Kept on every day; other placements are left out now and then so days differ. */
  core?: boolean;
}

const ana: Placement[] = [
  { stylist: 'ana', chair: 0, basin: 0, service: 'fullLightening', start: '09:00', developing: [30, 30, 15], core: true },
  { stylist: 'ana', chair: 1, basin: 1, service: 'tonerRefresh', start: '10:20', developing: [10], core: true },
  { stylist: 'ana', chair: 0, basin: 0, service: 'rootTouchUp', start: '13:00', developing: [35] },
  { stylist: 'ana', chair: 1, basin: 0, service: 'blowDry', start: '13:10', developing: [] },
  { stylist: 'ana', chair: 0, basin: 0, service: 'vividColour', start: '14:50', developing: [25, 35] },
];

const marcus: Placement[] = [
  { stylist: 'marcus', chair: 2, basin: 1, service: 'rootTouchUp', start: '11:00', developing: [35], core: true },
  { stylist: 'marcus', chair: 3, basin: 1, service: 'fringeTrim', start: '11:15', developing: [] },
  { stylist: 'marcus', chair: 2, basin: 1, service: 'fullLightening', start: '13:30', developing: [30, 30, 15], core: true },
  { stylist: 'marcus', chair: 3, basin: 0, service: 'tonerRefresh', start: '14:50', developing: [10], core: true },
  { stylist: 'marcus', chair: 2, basin: 1, service: 'cutFinish', start: '17:00', developing: [] },
  { stylist: 'marcus', chair: 3, basin: 1, service: 'cutFinish', start: '18:00', developing: [] },
];

const lee: Placement[] = [
  { stylist: 'lee', chair: 3, basin: 1, service: 'cutFinish', start: '10:00', developing: [] },
  { stylist: 'lee', chair: 1, basin: 1, service: 'cutFinish', start: '11:00', developing: [] },
  { stylist: 'lee', chair: 1, basin: 0, service: 'blowDry', start: '15:00', developing: [] },
  { stylist: 'lee', chair: 1, basin: 1, service: 'cutFinish', start: '16:10', developing: [] },
];

export const ordinaryDay: Placement[] = [...ana, ...marcus, ...lee];

/**
 * Sitting 1 of the correction (09:00 to about 15:05): its hands-free minutes are short (remover under heat,
 * lightener sections within the limit), so the window fit is a blow-dry inside the later root touch-up.
 */
export const correctionDayOne: Placement[] = [
  { stylist: 'ana', chair: 0, basin: 0, service: 'correction', sitting: 0, start: '09:00', developing: [10, 10, 25, 25, 10], core: true },
  { stylist: 'ana', chair: 0, basin: 0, service: 'rootTouchUp', start: '15:30', developing: [35], core: true },
  { stylist: 'ana', chair: 1, basin: 0, service: 'blowDry', start: '15:40', developing: [], core: true },
  ...marcus,
  ...lee,
];

/** Sitting 2 of the correction three open days later (3 to 5 calendar days), a blow-dry in its developing time. */
export const correctionDayTwo: Placement[] = [
  { stylist: 'ana', chair: 0, basin: 0, service: 'correction', sitting: 1, start: '09:00', developing: [35], core: true },
  { stylist: 'ana', chair: 1, basin: 0, service: 'blowDry', start: '10:30', developing: [], core: true },
  { stylist: 'ana', chair: 0, basin: 0, service: 'vividColour', start: '14:50', developing: [25, 35], core: true },
  ...marcus,
  ...lee,
];
