import { CONDITIONS, CONDITION_LABELS, type Condition } from '@benchproof/domain';
import { SimpleGrid, Text, UnstyledButton } from '@mantine/core';
import { ConditionGlyph } from './condition-badge';
import { CONDITION_COLOURS } from './condition-colours';
import classes from './condition-picker.module.css';

const SHORT: Record<Condition, string> = { sound: 'Sound', wearing: 'Wearing', worn: 'Worn', unsafe: 'Unsafe' };

/** The four-step scale as four big buttons (≥ 56 px): one tap with a gloved or greasy finger. */
export function ConditionPicker({
  value,
  onChange,
  disabled,
  label,
}: {
  value: Condition | null;
  onChange: (c: Condition) => void;
  disabled?: boolean;
  label: string;
}) {
  return (
    <SimpleGrid cols={4} spacing={6} role="group" aria-label={label}>
      {CONDITIONS.map((c) => {
        const active = value === c;
        return (
          <UnstyledButton
            key={c}
            className={classes.step}
            data-active={active || undefined}
            aria-pressed={active}
            aria-label={CONDITION_LABELS[c]}
            disabled={disabled}
            onClick={() => onChange(c)}
            style={{ '--step-colour': CONDITION_COLOURS[c] }}
          >
            <ConditionGlyph condition={c} size={24} />
            <Text size="sm" fw={700} c={active ? CONDITION_COLOURS[c] : undefined}>
              {SHORT[c]}
            </Text>
          </UnstyledButton>
        );
      })}
    </SimpleGrid>
  );
}
