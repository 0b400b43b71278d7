export { PairsPanel } from './components/pairs-panel';
export { pairImageSources } from './components/pair-image';
