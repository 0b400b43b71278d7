import type { Shape } from '@benchproof/annotation';
import { LabelDialog, ScaleDialog } from './shape-dialogs';

interface Props {
  /** A new scale or label shape waiting for its length or text. */
  asking: Shape | null;
  onDone: (shape: Shape) => void;
  onClose: () => void;
}

/** Asks for the known length of a new scale bar or the text of a new label before it is kept. */
export function AskDialogs({ asking, onDone, onClose }: Props) {
  return (
    <>
      <ScaleDialog
        opened={asking?.kind === 'scale'}
        onCancel={onClose}
        onDone={(mm) => {
          if (asking?.kind === 'scale') onDone({ ...asking, knownMm: mm });
          onClose();
        }}
      />
      {asking?.kind === 'label' && (
        <LabelDialog
          opened
          initial=""
          onCancel={onClose}
          onDone={(text) => {
            onDone({ ...asking, text });
            onClose();
          }}
        />
      )}
    </>
  );
}
