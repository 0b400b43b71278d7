import { Button, Group, Paper, Text } from '@mantine/core';
import { useState, type ReactNode } from 'react';

interface Props {
  /** What the first tap reads; the second tap on "confirmLabel" does it. */
  trigger: (ask: () => void) => ReactNode;
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
}

/**
 * A second tap for what cannot be undone (issuing a report, sending an e-mail): the first tap
 * shows the question in place with the confirm and cancel buttons; nothing happens until then.
 */
export function ConfirmStep({ trigger, question, confirmLabel, onConfirm }: Props) {
  const [asking, setAsking] = useState(false);
  if (!asking) return <>{trigger(() => setAsking(true))}</>;
  return (
    <Paper withBorder p="sm" role="group" aria-label={question}>
      <Text size="sm" fw={600} mb="xs">
        {question}
      </Text>
      <Group gap="xs">
        <Button
          size="md"
          onClick={() => {
            setAsking(false);
            onConfirm();
          }}
        >
          {confirmLabel}
        </Button>
        <Button size="md" variant="default" onClick={() => setAsking(false)}>
          Cancel
        </Button>
      </Group>
    </Paper>
  );
}
