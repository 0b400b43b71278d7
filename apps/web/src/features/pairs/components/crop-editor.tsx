import type { MediaAssetDto, PairCrop } from '@benchproof/contracts';
import { Button, Group, SegmentedControl, Stack, Text } from '@mantine/core';
import { useState, type MouseEvent } from 'react';
import { PairImage } from './pair-image';

const ZOOMS = ['1', '1.5', '2', '3'] as const;

/** A square-ish window 1/zoom of each side, centred on (cx, cy) but kept inside the picture. */
export function cropAround(cx: number, cy: number, zoom: number): PairCrop | null {
  if (zoom <= 1) return null;
  const w = 1 / zoom;
  const h = 1 / zoom;
  const x = Math.min(Math.max(cx - w / 2, 0), 1 - w);
  const y = Math.min(Math.max(cy - h / 2, 0), 1 - h);
  return { x: round(x), y: round(y), w: round(w), h: round(h) };
}
const round = (v: number) => Math.round(v * 1e4) / 1e4;

/** The chosen window drawn over the whole picture, everything outside it dimmed. */
function CropWindow({ crop }: { crop: PairCrop }) {
  return (
    <div
      style={{
        position: 'absolute',
        left: `${crop.x * 100}%`,
        top: `${crop.y * 100}%`,
        width: `${crop.w * 100}%`,
        height: `${crop.h * 100}%`,
        border: '3px solid #fff',
        boxShadow: '0 0 0 9999px rgba(0,0,0,0.5)',
        pointerEvents: 'none',
      }}
    />
  );
}

/**
 * Choose how close to zoom, then tap the spot to centre on: both shots of the pair get
 * the same window. Coarse on purpose: a gloved finger at the workstand.
 */
export function CropEditor({
  before,
  value,
  onSave,
  saving,
}: {
  before: MediaAssetDto;
  value: PairCrop | null;
  onSave: (crop: PairCrop | null) => void;
  saving: boolean;
}) {
  const [zoom, setZoom] = useState(value ? String(Math.round((1 / value.w) * 2) / 2) : '1');
  const [centre, setCentre] = useState(value ? { x: value.x + value.w / 2, y: value.y + value.h / 2 } : { x: 0.5, y: 0.5 });
  const crop = cropAround(centre.x, centre.y, Number(zoom));
  const tap = (e: MouseEvent<HTMLDivElement>) => {
    const r = e.currentTarget.getBoundingClientRect();
    setCentre({ x: (e.clientX - r.left) / r.width, y: (e.clientY - r.top) / r.height });
  };
  return (
    <Stack gap="xs">
      <SegmentedControl
        size="md"
        value={zoom}
        onChange={setZoom}
        data={ZOOMS.map((z) => ({ value: z, label: z === '1' ? 'Whole' : `${z}×` }))}
        aria-label="Zoom"
      />
      <Text size="sm" c="dimmed">
        Tap the part to centre on. The after shot gets the same window.
      </Text>
      <div onClick={tap} style={{ position: 'relative', cursor: 'crosshair', borderRadius: 8, overflow: 'hidden' }} data-testid="crop-area">
        <PairImage asset={before} alt="Before, whole picture" style={{ display: 'block', width: '100%' }} />
        {crop && <CropWindow crop={crop} />}
      </div>
      <Group justify="flex-end">
        <Button size="md" onClick={() => onSave(crop)} loading={saving}>
          {crop ? 'Use this window' : 'Show whole pictures'}
        </Button>
      </Group>
    </Stack>
  );
}
