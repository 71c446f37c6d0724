// The payments feature's public module: other features import it only from here.
export { openCheckout } from './checkout.service';
export { makePendingRefunds } from './refunds.service';
export { makeDecidedRefunds, settleDepositOutcome } from './deposit-outcome.service';
export { lockBookingForMoney } from './booking-money.repository';
export { moneyMoved } from './money-moved.repository';
export { closeStaleCheckouts, releaseUnpaidDeposits } from './payment-sweeps.service';
export { registerPaymentRoutes } from './payments.routes';
