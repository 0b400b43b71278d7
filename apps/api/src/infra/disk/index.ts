export { DiskSpace } from './disk-space';
