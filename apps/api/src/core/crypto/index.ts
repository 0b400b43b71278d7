export { openText, sealText } from './seal';
export { fillSecrets, openSecrets, sealSecrets, type Spelling, withPlaceholders } from './sealed-secrets';
