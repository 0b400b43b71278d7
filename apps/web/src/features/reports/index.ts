export { ReportSection } from './components/report-section';
export { VerifyReport } from './components/verify-report';
export { reportsQuery } from './api/reports';
