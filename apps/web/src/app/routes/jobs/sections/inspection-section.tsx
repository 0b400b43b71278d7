import { roleCan } from '@benchproof/contracts';
import { InspectionPanel } from '../../../../features/inspection';
import type { SectionProps } from './section-props';

export default function InspectionSection({ job, me, settings, frozen }: SectionProps) {
  return (
    <InspectionPanel
      jobId={job.id}
      chainPolicy={settings.chainLimits ?? undefined}
      lengthUnit={settings.units === 'imperial' ? 'in' : 'mm'}
      carbonFrame={job.bikeDetail.frameMaterial === 'carbon'}
      canRecord={roleCan(me.role, 'inspection.record') && !frozen}
    />
  );
}
