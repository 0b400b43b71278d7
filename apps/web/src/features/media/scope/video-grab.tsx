import { Alert, Box, Stack, Text } from '@mantine/core';
import { useEffect, useState } from 'react';
import { newItem, type ShotTags } from '../upload/queue';
import { uploadStore } from '../upload/upload-store';
import { FrameStepper } from './frame-stepper';
import { grabFrame, stillName } from './grab';
import { GrabButton } from './grab-button';
import { SCOPE_TAGS, ScopeTags } from './scope-tags';
import { VideoSourcePicker, type VideoSource } from './video-source';

function stillFor(source: VideoSource, file: File, ms: number, tags: ShotTags, jobId: number) {
  if (source.kind === 'asset') return newItem(jobId, file, tags, { source: 'scope', sourceAssetId: source.assetId, timecodeMs: ms });
  // The API ties a time code to a stored video only, so a local file's position goes into the caption.
  const caption = [tags.caption, `From ${source.name} at ${(ms / 1000).toFixed(3)} s`].filter(Boolean).join(' · ');
  return newItem(jobId, file, { ...tags, caption }, { source: 'scope' });
}

/** Play a recorded scope video, step to the frame that shows the damage, and grab it. */
export function VideoGrab({ jobId, initial }: { jobId: number; initial: VideoSource | null }) {
  const [source, setSource] = useState<VideoSource | null>(initial);
  const [video, setVideo] = useState<HTMLVideoElement | null>(null);
  const [time, setTime] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [tags, setTags] = useState<ShotTags>(SCOPE_TAGS);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => () => void (source?.kind === 'local' && URL.revokeObjectURL(source.src)), [source]);

  const grab = () => {
    if (!video || !source) return;
    const ms = Math.round(video.currentTime * 1000);
    grabFrame(video, stillName('frame'))
      .then((file) => uploadStore.dispatch({ type: 'add', items: [stillFor(source, file, ms, tags, jobId)] }))
      .catch((e: Error) => setError(e.message));
  };

  return (
    <Stack gap="sm">
      <VideoSourcePicker jobId={jobId} value={source} onChange={setSource} />
      {source ? (
        <Box bg="dark.9" style={{ borderRadius: 12, overflow: 'hidden' }}>
          <video
            ref={setVideo}
            key={source.src}
            src={source.src}
            playsInline
            preload="auto"
            data-testid="step-video"
            onTimeUpdate={(e) => setTime(e.currentTarget.currentTime)}
            onSeeked={(e) => setTime(e.currentTarget.currentTime)}
            onPlay={() => setPlaying(true)}
            onPause={() => setPlaying(false)}
            onError={() => setError('This video cannot be played in this browser.')}
            style={{ width: '100%', maxHeight: '60vh', display: 'block' }}
          />
        </Box>
      ) : (
        <Text c="dimmed">Pick a stored video or open one from this device.</Text>
      )}
      <FrameStepper video={video} time={time} playing={playing} />
      <GrabButton onGrab={grab} disabled={!source} />
      {error && (
        <Alert color="red" role="alert">
          {error}
        </Alert>
      )}
      <ScopeTags value={tags} onChange={setTags} />
    </Stack>
  );
}
