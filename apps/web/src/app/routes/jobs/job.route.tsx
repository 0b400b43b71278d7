import { isTerminalStatus } from '@benchproof/domain';
import { Tabs } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useParams, useSearchParams } from 'react-router';
import { FrozenNotice } from '../../../components/frozen-notice';
import { QueryState } from '../../../components/query-state';
import { useCan, useSession } from '../../../features/auth';
import { JobHeader, jobKeys, useJob } from '../../../features/jobs';
import { useOwnerEvents } from '../../../features/owner-links';
import { FailedMessagesNotice } from '../../../features/mail';
import { useShopSettings } from '../../../features/shop-settings';
import { useStaff } from '../staff';
import classes from './job.module.css';
import { JOB_SECTIONS, JobSectionBody, type JobSection } from './job-sections';

const isSection = (v: string | null): v is JobSection => JOB_SECTIONS.some((s) => s.value === v);

/** /jobs/:jobId — the header with the next move, then one section at a time (tabs scroll on phones). */
export function JobRoute() {
  const jobId = Number(useParams().jobId);
  const job = useJob(jobId);
  const settings = useShopSettings();
  const { data: me } = useSession();
  const can = useCan();
  const { mechanics } = useStaff();
  const [search, setSearch] = useSearchParams();
  const tab = search.get('section');
  const section: JobSection = isSection(tab) ? tab : 'intake';
  const qc = useQueryClient();
  // The owner acts on their own page; refresh everything of this job (status, findings, owner panel).
  useOwnerEvents(
    jobId,
    useCallback(() => void qc.invalidateQueries({ queryKey: jobKeys.detail(jobId) }), [qc, jobId]),
  );
  if (!job.data || !settings.data || !me) return <QueryState isLoading={job.isLoading || settings.isLoading} error={job.error ?? settings.error} />;
  // Evidence freezes at handover; only `jobs.reopen_evidence` may still correct it (the API audits each change).
  const closed = isTerminalStatus(job.data.status);
  const frozen = closed && !can('jobs.reopen_evidence');
  return (
    <>
      <JobHeader job={job.data} mechanics={mechanics} canAssign={can('jobs.edit')} />
      {closed && <FrozenNotice canCorrect={!frozen} />}
      {section !== 'messages' && <FailedMessagesNotice jobId={jobId} onOpen={() => setSearch({ section: 'messages' }, { replace: true })} />}
      <Tabs value={section} onChange={(v) => v && setSearch({ section: v }, { replace: true })} keepMounted={false}>
        <div className={classes.tabsScroll}>
          <Tabs.List style={{ flexWrap: 'nowrap' }}>
            {JOB_SECTIONS.map((s) => (
              <Tabs.Tab key={s.value} value={s.value} fz="md" mih={48} style={{ whiteSpace: 'nowrap' }}>
                {s.label}
              </Tabs.Tab>
            ))}
          </Tabs.List>
        </div>
        <Tabs.Panel value={section}>
          <JobSectionBody section={section} job={job.data} me={me} settings={settings.data} frozen={frozen} />
        </Tabs.Panel>
      </Tabs>
    </>
  );
}
