import { Badge, SegmentedControl } from '@mantine/core';
import { useState } from 'react';
import { annotatedUrl, useAnnotation } from '../api/annotation';
import classes from './annotated-still.module.css';

interface Props {
  mediaId: number;
  /** The plain screen derivative. */
  screenUrl: string;
  alt: string;
}

type Showing = 'annotated' | 'photo';

/**
 * A photo in the media viewer: when it has annotations it says so and opens on the annotated
 * render (what the owner and the report see), with a switch back to the untouched photo.
 */
export function AnnotatedStill({ mediaId, screenUrl, alt }: Props) {
  const annotation = useAnnotation(mediaId);
  const version = annotation.data?.version ?? 0;
  const [showing, setShowing] = useState<Showing>('annotated');
  const marked = version > 0 && showing === 'annotated';
  return (
    <>
      <img
        key={`${mediaId}-${marked ? version : 0}`}
        src={marked ? annotatedUrl(mediaId, 'screen', version) : screenUrl}
        alt={marked ? `${alt}, annotated` : alt}
        draggable={false}
        data-testid="viewer-image"
        data-showing={marked ? 'annotated' : 'photo'}
        className={classes.fill}
      />
      {version > 0 && (
        <div className={classes.bar} data-testid="annotated-switch">
          <Badge color="yellow" size="lg" variant="filled">
            Annotated
          </Badge>
          <SegmentedControl
            size="md"
            value={showing}
            onChange={(v) => setShowing(v)}
            data={[
              { value: 'annotated', label: 'Marked up' },
              { value: 'photo', label: 'Photo' },
            ]}
            aria-label="Show the photo with or without its annotations"
            classNames={{ label: classes.segmentLabel }}
          />
        </div>
      )}
    </>
  );
}
