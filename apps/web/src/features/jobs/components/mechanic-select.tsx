import { Select } from '@mantine/core';
import { useClickOnArrival } from '../../../lib/after-first-screen';
import type { Option } from './job-filters';

export interface MechanicSelectProps {
  mechanics: Option[];
  value: string | null;
  onChange: (value: string | null) => void;
  disabled: boolean;
  error: string | undefined;
  /** The user tapped the stand-in box before this code had loaded: open the list when it arrives. */
  openAtOnce?: boolean;
}

/** The mechanic box in the job header (its own chunk: Select brings the dropdown and its positioning code). */
export function MechanicSelect({ mechanics, value, onChange, disabled, error, openAtOnce = false }: MechanicSelectProps) {
  const box = useClickOnArrival<HTMLInputElement>(openAtOnce);
  return (
    <Select
      ref={box}
      label="Mechanic"
      placeholder="Not assigned"
      data={mechanics}
      value={value}
      onChange={onChange}
      disabled={disabled}
      error={error}
      clearable
    />
  );
}
