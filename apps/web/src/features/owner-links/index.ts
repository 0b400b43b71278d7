export { OwnerLinkPanel } from './components/owner-link-panel';
export { useOwnerEvents } from './hooks/use-owner-events';
