export { FileSniffer, SNIFFER, type SniffedType } from './file-sniffer';
