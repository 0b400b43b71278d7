import { SCALE_PRESETS } from '@benchproof/annotation';
import { Button, Group, Modal, NumberInput, Stack, Text, TextInput } from '@mantine/core';
import { useState } from 'react';

/** After drawing a scale line: what is its real length? A standard reference or a typed value. */
export function ScaleDialog({ opened, onDone, onCancel }: { opened: boolean; onDone: (mm: number) => void; onCancel: () => void }) {
  const [mm, setMm] = useState<number | string>('');
  const valid = typeof mm === 'number' && mm > 0 && mm <= 2000;
  return (
    <Modal opened={opened} onClose={onCancel} title="How long is the line you drew?" centered zIndex={400}>
      <Stack>
        <Text size="sm">Draw it over something of known length in the same plane as what you measure, e.g. a steel rule beside the chain.</Text>
        {SCALE_PRESETS.map((p) => (
          <Button key={p.id} size="lg" variant="light" onClick={() => onDone(p.mm)}>
            {p.label}
          </Button>
        ))}
        <NumberInput
          label="Or type the length (mm)"
          size="lg"
          min={0.1}
          max={2000}
          decimalScale={2}
          value={mm}
          onChange={setMm}
          error={mm !== '' && !valid ? 'Enter a length between 0.1 and 2000 mm.' : undefined}
          data-autofocus
        />
        <Group justify="flex-end">
          <Button size="lg" variant="default" onClick={onCancel}>
            Cancel
          </Button>
          <Button size="lg" disabled={!valid} onClick={() => valid && onDone(mm)}>
            Set scale
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}

export function LabelDialog({ opened, initial, onDone, onCancel }: { opened: boolean; initial: string; onDone: (text: string) => void; onCancel: () => void }) {
  const [text, setText] = useState(initial);
  // No error before the mechanic has typed anything; after that, an empty label says why it cannot be placed.
  const [touched, setTouched] = useState(false);
  const ok = text.trim().length > 0 && text.length <= 120;
  return (
    <Modal opened={opened} onClose={onCancel} title="Label" centered zIndex={400}>
      <Stack>
        <TextInput
          size="lg"
          label="Text"
          value={text}
          onChange={(e) => {
            setText(e.currentTarget.value);
            setTouched(true);
          }}
          maxLength={120}
          error={touched && !ok ? 'A label needs 1 to 120 characters.' : undefined}
          data-autofocus
        />
        <Group justify="flex-end">
          <Button size="lg" variant="default" onClick={onCancel}>
            Cancel
          </Button>
          <Button size="lg" disabled={!ok} onClick={() => onDone(text.trim())}>
            Place label
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
