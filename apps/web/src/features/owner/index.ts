export { OwnerPage } from './components/owner-page';
