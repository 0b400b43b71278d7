import type { OwnerShot } from '@benchproof/contracts';
import { Image, UnstyledButton } from '@mantine/core';
import { Suspense, useState } from 'react';
import classes from './owner.module.css';
import { ShotModal } from './owner-lazy';

/** Thumbnails that open full screen on tap; the viewer's code loads with the first tap. */
export function Shots({ shots, label }: { shots: OwnerShot[]; label: string }) {
  const [open, setOpen] = useState<OwnerShot | null>(null);
  const [viewed, setViewed] = useState(false);
  if (!shots.length) return null;
  return (
    <>
      <div className={classes.shots}>
        {shots.map((s, i) => (
          <UnstyledButton
            key={s.id}
            onClick={() => (setOpen(s), setViewed(true))}
            aria-label={`Open photo ${i + 1} of ${label} full screen`}
            className={classes.shotButton}
          >
            <Image src={s.thumbUrl} alt={s.caption || `Photo of ${label}`} loading="lazy" decoding="async" radius="sm" h={96} w={128} fit="cover" />
          </UnstyledButton>
        ))}
      </div>
      {/* Stays mounted after the first tap, so closing keeps the dialog's own transition. */}
      {viewed && (
        <Suspense fallback={null}>
          <ShotModal shot={open} label={label} onClose={() => setOpen(null)} />
        </Suspense>
      )}
    </>
  );
}
