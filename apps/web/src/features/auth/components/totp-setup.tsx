import type { TotpEnrolment } from '@benchproof/contracts';
import { Image, Stack, Text } from '@mantine/core';

/** The QR code to scan, and the secret to type where scanning is not possible. */
export function TotpSetup({ enrolment }: { enrolment: TotpEnrolment }) {
  return (
    <Stack gap="xs" align="center">
      <Text>Scan this with an authenticator app on your phone, then type the code it shows.</Text>
      <Image src={`data:image/svg+xml;utf8,${encodeURIComponent(enrolment.qrSvg)}`} alt="QR code for your authenticator app" w={200} h={200} />
      <Text size="sm" c="dimmed">
        Cannot scan? Enter this key:
      </Text>
      <Text ff="monospace" fz="sm" style={{ wordBreak: 'break-all' }} data-testid="totp-secret">
        {enrolment.secret}
      </Text>
    </Stack>
  );
}
