import type { MediaAssetDto } from '@benchproof/contracts';
import { Image, Input, SimpleGrid, Text, UnstyledButton } from '@mantine/core';

/** A row of big thumbnails to tap; the chosen one is framed. */
export function ShotPicker({
  label,
  shots,
  value,
  onChange,
  error,
}: {
  label: string;
  shots: MediaAssetDto[];
  value: number | null;
  onChange: (id: number) => void;
  error?: string;
}) {
  return (
    <Input.Wrapper label={label} error={error} size="md">
      {shots.length === 0 ? (
        <Text c="dimmed" size="sm">
          No {label.toLowerCase()} in this area.
        </Text>
      ) : (
        <SimpleGrid cols={{ base: 3, sm: 4 }} spacing={6} mt={4} role="radiogroup" aria-label={label}>
          {shots.map((a) => (
            <UnstyledButton
              key={a.id}
              role="radio"
              aria-checked={value === a.id}
              aria-label={`${label}: ${a.caption || `shot ${a.id}`}`}
              onClick={() => onChange(a.id)}
              style={{
                borderRadius: 8,
                padding: 3,
                minHeight: 64,
                outline: value === a.id ? '4px solid var(--mantine-primary-color-filled)' : '1px solid var(--mantine-color-default-border)',
              }}
            >
              <Image src={a.urls.thumb ?? undefined} alt="" radius="sm" h={72} fit="cover" />
            </UnstyledButton>
          ))}
        </SimpleGrid>
      )}
    </Input.Wrapper>
  );
}
