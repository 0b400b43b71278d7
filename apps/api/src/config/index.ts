export { APP_CONFIG, ConfigError, REPO_ROOT, loadConfig, type AppConfig } from './app-config';
export { ConfigModule } from './config.module';
