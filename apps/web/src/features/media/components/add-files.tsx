import '@mantine/dropzone/styles.css';
import { Box, Button, Group, Stack, Text } from '@mantine/core';
import { Dropzone } from '@mantine/dropzone';
import { IconCamera, IconUpload } from '@tabler/icons-react';
import type { MediaSource } from '@benchproof/domain';
import { useRef } from 'react';

const ACCEPT = 'image/*,video/*';

/** A big camera button (the phone's camera app, several shots at once) and, on wider screens, a drop area. */
export function AddFiles({ onFiles }: { onFiles: (files: File[], source: MediaSource) => void }) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <Stack gap="sm">
      <input
        ref={input}
        type="file"
        accept={ACCEPT}
        capture="environment"
        multiple
        hidden
        data-testid="camera-input"
        aria-label="Take or choose shots"
        onChange={(e) => {
          const files = Array.from(e.currentTarget.files ?? []);
          e.currentTarget.value = '';
          if (files.length) onFiles(files, 'camera');
        }}
      />
      <Button size="xl" h={88} fullWidth leftSection={<IconCamera size={36} />} onClick={() => input.current?.click()} styles={{ label: { fontSize: 20 } }}>
        Take shots
      </Button>
      <Box visibleFrom="sm">
        <Dropzone onDrop={(files) => onFiles(files, 'upload')} accept={{ 'image/*': [], 'video/*': [] }} multiple radius="md" p="lg">
          <Group justify="center" gap="md" mih={90} style={{ pointerEvents: 'none' }}>
            <IconUpload size={40} stroke={1.5} />
            <div>
              <Text size="lg" fw={600}>
                Drop photos or videos here
              </Text>
              <Text size="sm" c="dimmed">
                or click to choose files from this computer
              </Text>
            </div>
          </Group>
        </Dropzone>
      </Box>
    </Stack>
  );
}
