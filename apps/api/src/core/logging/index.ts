export { requestLogging, redactUrl } from './request-logging';
