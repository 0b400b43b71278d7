import { CONDITION_LABELS, DO_NOT_RIDE, type Condition } from '@benchproof/domain';
import { Group, Text } from '@mantine/core';
import { CONDITION_COLOURS } from './condition-colours';

/**
 * One glyph per step, drawn on a 20×20 grid:
 * sound = open ring with a tick, wearing = ring half filled,
 * worn = filled disc with a bar, unsafe = filled octagon with "!".
 */
function GlyphShape({ condition, colour }: { condition: Condition; colour: string }) {
  switch (condition) {
    case 'sound':
      return (
        <>
          <circle cx="10" cy="10" r="7.5" fill="none" stroke={colour} strokeWidth="2.2" />
          <path d="M6.4 10.3 L9 12.8 L13.8 7.4" fill="none" stroke={colour} strokeWidth="2.2" strokeLinecap="round" strokeLinejoin="round" />
        </>
      );
    case 'wearing':
      return (
        <>
          <circle cx="10" cy="10" r="7.5" fill="none" stroke={colour} strokeWidth="2.2" />
          <path d="M10 2.5 A7.5 7.5 0 0 0 10 17.5 Z" fill={colour} />
        </>
      );
    case 'worn':
      return (
        <>
          <circle cx="10" cy="10" r="8.6" fill={colour} />
          <rect x="5" y="8.6" width="10" height="2.8" rx="1" fill="#FFFFFF" />
        </>
      );
    case 'unsafe':
      return (
        <>
          <polygon points="6.3,1.2 13.7,1.2 18.8,6.3 18.8,13.7 13.7,18.8 6.3,18.8 1.2,13.7 1.2,6.3" fill={colour} />
          <rect x="8.8" y="4.6" width="2.4" height="7.2" rx="1" fill="#FFFFFF" />
          <circle cx="10" cy="14.6" r="1.4" fill="#FFFFFF" />
        </>
      );
  }
}

/** The condition glyph alone (decorative; pair it with text). */
export function ConditionGlyph({ condition, size = 20 }: { condition: Condition; size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 20 20" aria-hidden="true" focusable="false" data-condition={condition} style={{ flex: 'none' }}>
      <GlyphShape condition={condition} colour={CONDITION_COLOURS[condition]} />
    </svg>
  );
}

/** Glyph + word, e.g. "◐ Wearing"; unsafe always says "do not ride". */
export function ConditionBadge({ condition, size = 'md' }: { condition: Condition | null; size?: 'sm' | 'md' | 'lg' }) {
  if (!condition) {
    return (
      <Text size={size} c="dimmed" span>
        Not checked
      </Text>
    );
  }
  const glyph = size === 'lg' ? 26 : size === 'sm' ? 16 : 20;
  const label = condition === 'unsafe' ? `Unsafe — ${DO_NOT_RIDE.toLowerCase()}` : CONDITION_LABELS[condition];
  return (
    <Group gap={6} wrap="nowrap" component="span" style={{ display: 'inline-flex' }}>
      <ConditionGlyph condition={condition} size={glyph} />
      <Text span size={size} fw={condition === 'unsafe' ? 800 : 600} c={CONDITION_COLOURS[condition]}>
        {label}
      </Text>
    </Group>
  );
}
