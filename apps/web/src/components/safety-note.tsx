import { Alert, type AlertProps } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/**
 * A caution in a fixed place beside safety-relevant items (DESIGN.md, Safety).
 * Callers pass one of libs/domain's safety texts, never their own wording.
 */
export function SafetyNote({ text, title = 'Safety', ...rest }: { text: string; title?: string } & Omit<AlertProps, 'children' | 'title'>) {
  return (
    <Alert color="brass" variant="light" icon={<IconAlertTriangle />} title={title} {...rest}>
      {text}
    </Alert>
  );
}
