export { BackupsModule } from './backups.module';
