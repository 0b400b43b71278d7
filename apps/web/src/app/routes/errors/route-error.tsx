import { Alert, Button, Center, Stack, Title } from '@mantine/core';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { ApiError } from '../../../lib/api-client';
import { NotFoundRoute } from './not-found.route';

/** Route error boundary: a clear message and a way back, never a blank page. */
export function RouteError() {
  const error = useRouteError();
  if ((isRouteErrorResponse(error) && error.status === 404) || (error instanceof ApiError && error.code === 'NOT_FOUND')) return <NotFoundRoute />;
  const message = error instanceof Error ? error.message : 'Unexpected error.';
  return (
    <Center mih="60dvh" p="md">
      <Stack maw={520}>
        <Title order={2}>This page hit a snag</Title>
        <Alert color="red" variant="light">
          {message}
        </Alert>
        <Button onClick={() => window.location.reload()} size="lg">
          Reload
        </Button>
        <Button component={Link} to="/jobs" variant="subtle">
          Back to jobs
        </Button>
      </Stack>
    </Center>
  );
}
