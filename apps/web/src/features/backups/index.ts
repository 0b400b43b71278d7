export { BackupsPanel } from './components/backups-panel';
