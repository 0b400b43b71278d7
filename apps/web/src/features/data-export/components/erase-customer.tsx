import { Alert, Button, Checkbox, List, Modal, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { useEraseCustomer } from '../api/data-export';

function WhatHappens() {
  return (
    <Stack gap="xs">
      <Text size="sm" fw={600}>
        Removed for good
      </Text>
      <List size="sm" spacing={4}>
        <List.Item>Name, e-mail, phone and notes, and the names and addresses on consent records, e-mails and owner links.</List.Item>
        <List.Item>Bike serial numbers and bike notes.</List.Item>
        <List.Item>Photos and videos of jobs that were never handed back.</List.Item>
        <List.Item>Report PDF files (they print the name). Their fingerprints stay, so a copy the customer holds still checks out.</List.Item>
        <List.Item>Showcase consent is withdrawn: the customer’s photos leave the showcase and cannot be downloaded for it.</List.Item>
      </List>
      <Text size="sm" fw={600}>
        Kept, without the name
      </Text>
      <List size="sm" spacing={4}>
        <List.Item>
          Photos and videos of jobs handed back to the customer. They show only the bike and the work, and the shop keeps its records of work done, including
          safety work the customer chose not to have. How long such records must be kept depends on local rules.
        </List.Item>
        <List.Item>The job records themselves (what was checked and done, prices, payments), now without the customer’s name.</List.Item>
      </List>
    </Stack>
  );
}

/** The manager's "erase this customer" on request: what goes, what stays and why, a confirmation, then the counts. */
export function EraseCustomer({ customerId, name }: { customerId: number; name: string }) {
  const [opened, { open, close }] = useDisclosure();
  const [asked, setAsked] = useState(false);
  const erase = useEraseCustomer(customerId);
  const done = erase.data;
  return (
    <>
      <Button size="lg" color="red" variant="outline" leftSection={<IconTrash />} onClick={open}>
        Erase this customer
      </Button>
      <Modal opened={opened} onClose={close} title={done ? 'Erased' : `Erase ${name}?`} size="lg">
        {done ? (
          <Alert color="teal" role="status" title="Customer erased">
            {done.jobs} {done.jobs === 1 ? 'job' : 'jobs'} cleared of personal data; {done.mediaDeleted} photos and videos deleted, {done.mediaKept} kept with
            handed-back jobs; {done.reportFilesDeleted} report files deleted.
          </Alert>
        ) : (
          <Stack>
            <Text size="sm">Do this when the customer asks to be forgotten. It cannot be undone.</Text>
            <WhatHappens />
            <Checkbox checked={asked} onChange={(e) => setAsked(e.currentTarget.checked)} label="The customer asked for this, and I have checked it is them" />
            {erase.error && (
              <Alert color="red" role="alert">
                {erase.error.message}
              </Alert>
            )}
            <Button size="lg" color="red" disabled={!asked} loading={erase.isPending} onClick={() => erase.mutate()}>
              Erase for good
            </Button>
            <Button size="lg" variant="default" onClick={close}>
              Cancel
            </Button>
          </Stack>
        )}
      </Modal>
    </>
  );
}
