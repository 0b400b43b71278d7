export { FailedWorkList } from './components/failed-work-list';
export { workWhat, workWhy } from './components/work-words';
