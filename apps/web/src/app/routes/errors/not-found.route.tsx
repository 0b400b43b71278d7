import { Button, Center, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router';

export function NotFoundRoute() {
  return (
    <Center mih="60dvh" p="md">
      <Stack align="center" gap="sm">
        <Title order={1}>Nothing on this hook</Title>
        <Text c="dimmed" ta="center">
          The page you asked for does not exist, or it belongs to another workshop.
        </Text>
        <Button component={Link} to="/jobs" size="lg">
          Back to jobs
        </Button>
      </Stack>
    </Center>
  );
}
