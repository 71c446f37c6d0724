// The live events feature's public module: other features and the app import it only from here.
export { createLiveHub, type LiveHub } from './live-hub';
export { registerLiveEventRoutes } from './live-events.routes';
