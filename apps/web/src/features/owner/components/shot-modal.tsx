import type { OwnerShot } from '@benchproof/contracts';
import { CloseButton, Modal } from '@mantine/core';
import classes from './owner.module.css';

/**
 * One photo full screen. The image sits in a scroll box with native pinch-zoom allowed, so two fingers
 * zoom and one pans (no gesture library needed on a phone).
 */
export function ShotModal({ shot, label, onClose }: { shot: OwnerShot | null; label: string; onClose: () => void }) {
  return (
    <Modal opened={shot !== null} onClose={onClose} fullScreen withCloseButton={false} padding={0} styles={{ body: { height: '100%', background: '#000' } }}>
      {shot && (
        <div className={classes.viewer}>
          <CloseButton size="xl" aria-label="Close photo" onClick={onClose} className={classes.viewerClose} variant="filled" />
          <img src={shot.screenUrl} alt={shot.caption || `Photo of ${label}`} className={classes.viewerImage} />
          {shot.caption && <div className={classes.viewerCaption}>{shot.caption}</div>}
        </div>
      )}
    </Modal>
  );
}
