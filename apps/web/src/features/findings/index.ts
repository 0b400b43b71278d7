export { findingKeys } from './api/findings';
export type { ShopRates } from './components/estimate-preview';
export { FindingsPanel } from './components/findings-panel';
