import type { FindingDto } from '@benchproof/contracts';
import { Button, Group, Modal } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconEdit, IconMessageCircle, IconReceipt } from '@tabler/icons-react';
import { DecisionForm } from './decision-form';
import type { ShopRates } from './estimate-preview';
import { FindingForm } from './finding-form';
import { RecommendationEditor } from './recommendation-editor';

interface Props {
  jobId: number;
  finding: FindingDto;
  rates: ShopRates;
  canDecide: boolean;
  canEdit: boolean;
  ownerName: string;
  me: { id: number; name: string };
}

/** The finding's buttons (edit, price, record the owner's answer), each opening its form in a dialog. */
export function FindingActions({ jobId, finding, rates, canDecide, canEdit, ownerName, me }: Props) {
  const [edit, editModal] = useDisclosure();
  const [price, priceModal] = useDisclosure();
  const [decide, decideModal] = useDisclosure();
  const recommendation = finding.recommendation;
  return (
    <>
      <Group gap="xs">
        {canEdit && (
          <Button variant="default" leftSection={<IconEdit size={18} />} onClick={editModal.open}>
            Edit
          </Button>
        )}
        <Button variant="light" leftSection={<IconReceipt size={18} />} onClick={priceModal.open}>
          {recommendation ? 'Change price' : 'Price it'}
        </Button>
        {canDecide && recommendation && (
          <Button leftSection={<IconMessageCircle size={18} />} onClick={decideModal.open}>
            Record owner’s answer
          </Button>
        )}
      </Group>
      <Modal opened={edit} onClose={editModal.close} title="Edit finding" size="lg">
        <FindingForm jobId={jobId} finding={finding} onDone={editModal.close} />
      </Modal>
      <Modal opened={price} onClose={priceModal.close} title="Recommendation and price" size="lg" fullScreen={false}>
        <RecommendationEditor
          jobId={jobId}
          findingId={finding.id}
          condition={finding.condition}
          current={recommendation}
          rates={rates}
          onDone={priceModal.close}
        />
      </Modal>
      <Modal opened={decide} onClose={decideModal.close} title="Owner’s decision" size="lg">
        {recommendation && (
          <DecisionForm jobId={jobId} recommendationId={recommendation.id} ownerName={ownerName} recorderName={me.name} onDone={decideModal.close} />
        )}
      </Modal>
    </>
  );
}
