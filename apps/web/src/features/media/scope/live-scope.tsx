import { Alert, Box, Button, Group, Select, Stack } from '@mantine/core';
import { IconRefresh } from '@tabler/icons-react';
import { useRef, useState } from 'react';
import { newItem, type ShotTags } from '../upload/queue';
import { uploadStore } from '../upload/upload-store';
import { grabFrame, stillName } from './grab';
import { GrabButton } from './grab-button';
import { SCOPE_TAGS, ScopeTags } from './scope-tags';
import { useCamera } from './use-camera';

/** Live picture from a camera or USB borescope; each grab is uploaded as a scope still. */
export function LiveScope({ jobId }: { jobId: number }) {
  const video = useRef<HTMLVideoElement>(null);
  const cam = useCamera(video);
  const [tags, setTags] = useState<ShotTags>(SCOPE_TAGS);
  const [grabError, setGrabError] = useState<string | null>(null);

  const grab = () => {
    if (!video.current) return;
    grabFrame(video.current, stillName('scope'))
      .then((file) => {
        setGrabError(null);
        uploadStore.dispatch({ type: 'add', items: [newItem(jobId, file, tags, { source: 'scope' })] });
      })
      .catch((e: Error) => setGrabError(e.message));
  };

  const options = cam.devices.map((d, i) => ({ value: d.deviceId || `camera-${i}`, label: d.label || `Camera ${i + 1}` }));
  return (
    <Stack gap="sm">
      <Group gap="sm" align="flex-end" wrap="nowrap">
        <Select
          label="Camera or scope"
          placeholder="Default camera"
          data={options}
          value={cam.deviceId}
          onChange={(v) => v && cam.setDeviceId(v)}
          style={{ flex: 1 }}
        />
        <Button variant="default" size="md" onClick={cam.refresh} aria-label="Refresh the camera list">
          <IconRefresh size={20} />
        </Button>
      </Group>
      {cam.error && (
        <Alert color="red" role="alert">
          {cam.error}
        </Alert>
      )}
      <Box bg="dark.9" style={{ borderRadius: 12, overflow: 'hidden', aspectRatio: '4 / 3', display: 'flex', alignItems: 'center', justifyContent: 'center' }}>
        <video ref={video} autoPlay muted playsInline data-testid="live-video" style={{ width: '100%', height: '100%', objectFit: 'contain' }} />
      </Box>
      <GrabButton onGrab={grab} disabled={!cam.live} />
      {grabError && <Alert color="red">{grabError}</Alert>}
      <ScopeTags value={tags} onChange={setTags} />
    </Stack>
  );
}
