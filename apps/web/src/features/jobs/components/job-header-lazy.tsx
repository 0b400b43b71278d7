import { ComboboxChevron, Input, TextInput } from '@mantine/core';
import { lazy, Suspense, useState } from 'react';
import { useAfterFirstScreen } from '../../../lib/after-first-screen';
import type { MechanicSelectProps } from './mechanic-select';

const Select = lazy(async () => ({ default: (await import('./mechanic-select')).MechanicSelect }));

/**
 * The mechanic box. The first screen shows the same box as plain input; the real Select (with its dropdown
 * and positioning code, about 35 KB gzip) loads a moment later, or on the first tap
 * (which it then replays, so the list opens). Not on hover or focus: swapping the box under a pressed pointer would
 * swallow the click.
 */
export function MechanicBox(props: MechanicSelectProps) {
  const [ready, wake] = useAfterFirstScreen();
  const [tapped, setTapped] = useState(false);
  const label = props.mechanics.find((m) => m.value === props.value)?.label ?? '';
  const still = (
    <TextInput
      label="Mechanic"
      placeholder="Not assigned"
      value={label}
      readOnly
      pointer
      disabled={props.disabled}
      error={props.error}
      // The same right section as the Select: the chevron, and a clear button while someone is assigned.
      __defaultRightSection={<ComboboxChevron />}
      __clearSection={<Input.ClearButton tabIndex={-1} aria-hidden onMouseDown={(e) => e.preventDefault()} onClick={() => props.onChange(null)} />}
      __clearable={props.value !== null && !props.disabled}
      rightSectionPointerEvents="none"
      onKeyDown={(e) => ['Enter', ' ', 'ArrowDown', 'ArrowUp'].includes(e.key) && (setTapped(true), wake())}
      onClick={() => (setTapped(true), wake())}
    />
  );
  if (!ready) return still;
  return (
    <Suspense fallback={still}>
      <Select {...props} openAtOnce={tapped} />
    </Suspense>
  );
}
