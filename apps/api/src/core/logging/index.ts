export { createLogger, requestLog, redactUrl, NestPinoLogger } from './request-log';
