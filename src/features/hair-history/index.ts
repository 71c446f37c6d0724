// The hair history feature's public module: other features import it only from here.
export { HairHistoryForm } from './components/hair-history-form';
export { HairHistorySummary } from './components/hair-history-summary';
