import { Button, Group, Modal, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlus } from '@tabler/icons-react';
import { QueryState } from '../../../components/query-state';
import { useFindings } from '../api/findings';
import { EstimateSummary } from './estimate-summary';
import { FindingCard, type FindingCardProps } from './finding-card';
import { FindingForm } from './finding-form';

type Props = Omit<FindingCardProps, 'finding'>;

/** Findings of a job with their estimate; desk and manager record the owner's answers. */
export function FindingsPanel(props: Props) {
  const findings = useFindings(props.jobId);
  const [adding, add] = useDisclosure();
  return (
    <Stack>
      <EstimateSummary jobId={props.jobId} />
      <Group justify="space-between">
        <Title order={3} size="h4">
          Findings
        </Title>
        {props.canEdit && (
          <Button leftSection={<IconPlus />} onClick={add.open}>
            Add finding
          </Button>
        )}
      </Group>
      <QueryState isLoading={findings.isLoading} error={findings.error} />
      {findings.data?.length === 0 && <Text c="dimmed">Nothing found yet. Findings from the inspection go here with their price.</Text>}
      {findings.data?.map((f) => (
        <FindingCard key={f.id} finding={f} {...props} />
      ))}
      <Modal opened={adding} onClose={add.close} title="Add a finding" size="lg">
        <FindingForm jobId={props.jobId} onDone={add.close} />
      </Modal>
    </Stack>
  );
}
