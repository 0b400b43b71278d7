import type { InspectionDto } from '@benchproof/contracts';
import { CONDITIONS, type ChainLimitPolicy, type Condition, type LengthUnit } from '@benchproof/domain';
import { Accordion, Group, Progress, Stack, Text } from '@mantine/core';
import { ConditionBadge, ConditionGlyph } from '../../../components/condition-badge';
import { QueryState } from '../../../components/query-state';
import { SafetyNote } from '../../../components/safety-note';
import { useInspection } from '../api/inspection';
import { areaCautions } from './area-cautions';
import { CheckpointCard } from './checkpoint-card';

type Area = InspectionDto['areas'][number];

function Counts({ area }: { area: Area }) {
  const counts = CONDITIONS.map((c) => [c, area.checkpoints.filter((cp) => cp.condition === c).length] as [Condition, number]).filter(([, n]) => n > 0);
  const open = area.checkpoints.filter((cp) => !cp.condition).length;
  return (
    <Group gap={8} wrap="wrap">
      {counts.map(([c, n]) => (
        <Group key={c} gap={2} wrap="nowrap" aria-label={`${n} ${c}`}>
          <ConditionGlyph condition={c} size={16} />
          <Text size="sm" fw={600}>
            {n}
          </Text>
        </Group>
      ))}
      {open > 0 && (
        <Text size="sm" c="dimmed">
          {open} to check
        </Text>
      )}
    </Group>
  );
}

interface Props {
  jobId: number;
  chainPolicy?: Partial<ChainLimitPolicy>;
  lengthUnit: LengthUnit;
  carbonFrame: boolean;
  /** Recording allowed now (role and a job not frozen at handover); read only otherwise. */
  canRecord?: boolean;
}

/** The inspection: one accordion item per area, each checkpoint a card. */
export function InspectionPanel({ jobId, chainPolicy, lengthUnit, carbonFrame, canRecord = true }: Props) {
  const inspection = useInspection(jobId);
  const data = inspection.data;
  if (!data) return <QueryState isLoading={inspection.isLoading} error={inspection.error} />;
  return (
    <Stack>
      <Stack gap={4}>
        <Text fw={600}>
          {data.inspected} of {data.total} checkpoints done · {data.drivetrainSpeeds === 1 ? 'single speed' : `${data.drivetrainSpeeds}-speed`} chain limits
        </Text>
        <Progress value={data.total ? (100 * data.inspected) / data.total : 0} aria-label="Inspection progress" size="lg" />
      </Stack>
      <Accordion variant="separated" multiple chevronPosition="right">
        {data.areas.map((area) => (
          <Accordion.Item key={area.area} value={area.area}>
            <Accordion.Control mih={56}>
              <Stack gap={2}>
                <Group justify="space-between" wrap="nowrap" pr="xs">
                  <Text fw={700}>{area.label}</Text>
                  {area.worstCondition && <ConditionBadge condition={area.worstCondition} size="sm" />}
                </Group>
                <Counts area={area} />
              </Stack>
            </Accordion.Control>
            <Accordion.Panel>
              <Stack>
                {areaCautions(area.area, area.cautions, carbonFrame).map((t) => (
                  <SafetyNote key={t} text={t} />
                ))}
                {area.checkpoints.map((cp) => (
                  <CheckpointCard
                    key={cp.id}
                    jobId={jobId}
                    checkpoint={cp}
                    speeds={data.drivetrainSpeeds}
                    chainPolicy={chainPolicy}
                    lengthUnit={lengthUnit}
                    canRecord={canRecord}
                  />
                ))}
              </Stack>
            </Accordion.Panel>
          </Accordion.Item>
        ))}
      </Accordion>
    </Stack>
  );
}
