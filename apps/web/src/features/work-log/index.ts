export { workLogKeys } from './api/work-log';
export { TorqueEntries } from './components/torque-entries';
export { WorkEntries } from './components/work-entries';
