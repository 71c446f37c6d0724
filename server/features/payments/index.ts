// The payments feature's public module: other features import it only from here.
export { openCheckout } from './checkout.service';
export { makePendingRefunds } from './refunds.service';
export { closeStaleCheckouts, releaseUnpaidDeposits } from './payment-sweeps.service';
export { registerPaymentRoutes } from './payments.routes';
