// The quote prices feature's public module: other features import it only from here.
export { correctionRate, productCentsPerGram } from './quote-prices.repository';
