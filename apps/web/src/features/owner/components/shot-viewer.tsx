import type { OwnerShot } from '@benchproof/contracts';
import { CloseButton, Image, Modal, UnstyledButton } from '@mantine/core';
import { useState } from 'react';
import classes from './owner.module.css';

/**
 * Thumbnails that open full-screen on tap. In the viewer the image sits in a
 * scroll box with native pinch-zoom allowed, so two fingers zoom and one pans
 * (no gesture library needed on a phone).
 */
export function Shots({ shots, label }: { shots: OwnerShot[]; label: string }) {
  const [open, setOpen] = useState<OwnerShot | null>(null);
  if (!shots.length) return null;
  return (
    <>
      <div className={classes.shots}>
        {shots.map((s, i) => (
          <UnstyledButton key={s.id} onClick={() => setOpen(s)} aria-label={`Open photo ${i + 1} of ${label} full screen`} className={classes.shotButton}>
            <Image src={s.thumbUrl} alt={s.caption || `Photo of ${label}`} loading="lazy" decoding="async" radius="sm" h={96} w={128} fit="cover" />
          </UnstyledButton>
        ))}
      </div>
      <Modal
        opened={open !== null}
        onClose={() => setOpen(null)}
        fullScreen
        withCloseButton={false}
        padding={0}
        styles={{ body: { height: '100%', background: '#000' } }}
      >
        {open && (
          <div className={classes.viewer}>
            <CloseButton size="xl" aria-label="Close photo" onClick={() => setOpen(null)} className={classes.viewerClose} variant="filled" />
            <img src={open.screenUrl} alt={open.caption || `Photo of ${label}`} className={classes.viewerImage} />
            {open.caption && <div className={classes.viewerCaption}>{open.caption}</div>}
          </div>
        )}
      </Modal>
    </>
  );
}
