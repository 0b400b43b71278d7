export { jobKeys, jobQuery, jobsQuery, useJob } from './api/jobs';
export { BookInForm, type BookInSlots, type FieldGetter, type PickedCustomer } from './components/book-in-form';
export { FinalCheckPanel } from './components/final-check-panel';
export { IntakeSection } from './components/intake-section';
export { JobHeader } from './components/job-header';
export type { Option } from './components/job-filters';
export { JobStatusBadge } from './components/job-status-badge';
export { JobsTable } from './components/jobs-table';
export { PromisedDate } from './components/promised-date';
