export { OwnerPage } from './components/owner-page';
export { OwnerLinkPanel } from './components/owner-link-panel';
export { useOwnerEvents } from './hooks/use-owner-events';
