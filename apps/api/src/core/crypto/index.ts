export { openText, sealText } from './seal';
