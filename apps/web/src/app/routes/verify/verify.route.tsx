import { Container } from '@mantine/core';
import { useSearchParams } from 'react-router';
import { Logo } from '../../../components/logo';
import { VerifyReport } from '../../../features/reports';

/** /verify?c=<code>: public, no sign-in; the code comes from the link printed on a report. */
export function VerifyRoute() {
  const [params] = useSearchParams();
  return (
    <Container size="sm" py="xl">
      <Logo />
      <div style={{ marginTop: 24 }}>
        <VerifyReport initialCode={params.get('c') ?? undefined} />
      </div>
    </Container>
  );
}
