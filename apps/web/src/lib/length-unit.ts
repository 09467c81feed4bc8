import { useSyncExternalStore } from 'react';
import type { LengthDisplayUnit } from '@keybed/shared';

/** The units a member may choose for piano sizes; the workshop's demo default is feet and inches. */
export type PreferredLengthUnit = Extract<LengthDisplayUnit, 'ft-in' | 'cm'>;

export const LENGTH_UNIT_OPTIONS: ReadonlyArray<{ value: PreferredLengthUnit; label: string }> = [
  { value: 'ft-in', label: 'ft-in' },
  { value: 'cm', label: 'cm' },
];

const STORAGE_KEY = 'keybed.lengthUnit';
const DEFAULT_UNIT: PreferredLengthUnit = 'ft-in';
const listeners = new Set<() => void>();

function read(): PreferredLengthUnit {
  try {
    const stored = window.localStorage.getItem(STORAGE_KEY);
    return stored === 'cm' || stored === 'ft-in' ? stored : DEFAULT_UNIT;
  } catch {
    return DEFAULT_UNIT;
  }
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  // Another tab changing the setting updates this one too.
  const onStorage = (event: StorageEvent) => event.key === STORAGE_KEY && listener();
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

export function setLengthUnit(unit: PreferredLengthUnit) {
  try {
    window.localStorage.setItem(STORAGE_KEY, unit);
  } catch {
    // Private modes may refuse storage; the choice then lasts until reload.
  }
  for (const listener of listeners) listener();
}

/** The member's preferred unit for piano sizes, kept in this browser. */
export function useLengthUnit(): PreferredLengthUnit {
  return useSyncExternalStore(subscribe, read, () => DEFAULT_UNIT);
}
