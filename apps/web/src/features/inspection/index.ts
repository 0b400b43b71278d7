export { inspectionKey, inspectionQuery } from './api/inspection';
export { InspectionPanel } from './components/inspection-panel';
