import { PageHeader } from '../../../components/page-header';
import { FailedWorkList } from '../../../features/background-work';

/** /settings/work — background work that failed (photo previews, reports, e-mails), with "Try again now" (manager). */
export function WorkRoute() {
  return (
    <>
      <PageHeader
        title="Failed work"
        subtitle="Work the server does in the background that did not finish. Most of it tries again by itself; you can start it again now."
      />
      <FailedWorkList />
    </>
  );
}
