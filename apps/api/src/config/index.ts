export { APP_CONFIG, REPO_ROOT, loadConfig, type AppConfig } from './app-config';
export { ConfigModule } from './config.module';
