import { Alert, Center, Loader } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/** Loading spinner or error message for a query; renders nothing once data is there. */
export function QueryState({ isLoading, error }: { isLoading: boolean; error: Error | null }) {
  if (error) {
    return (
      <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
        {error.message}
      </Alert>
    );
  }
  if (isLoading) {
    return (
      <Center py="xl">
        <Loader aria-label="Loading" />
      </Center>
    );
  }
  return null;
}
