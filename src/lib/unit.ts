/**
 * The display unit every screen follows. It starts as the studio's default unit; a person can
 * switch it anywhere and every screen re-renders in the new unit. The choice lasts for the
 * browser tab (sessionStorage), so the next sign-in starts again from the studio's unit.
 */
import { useSyncExternalStore } from 'react';
import type { LengthUnit } from '@shared/units';

/** Units a person can choose to see lengths in (the studio's choices). */
export type DisplayUnit = Extract<LengthUnit, 'in' | 'cm'>;

export const DISPLAY_UNITS: readonly DisplayUnit[] = ['in', 'cm'];

const STORAGE_KEY = 'knitwright.display-unit';

interface UnitState {
  studioDefault: DisplayUnit;
  chosen: DisplayUnit | null;
}

/** Parses a stored value; anything but a known unit counts as no choice. */
export function displayUnitRead(raw: string | null | undefined): DisplayUnit | null {
  return raw === 'in' || raw === 'cm' ? raw : null;
}

function storageRead(): DisplayUnit | null {
  try {
    return displayUnitRead(globalThis.sessionStorage?.getItem(STORAGE_KEY));
  } catch {
    return null;
  }
}

function storageWrite(unit: DisplayUnit | null): void {
  try {
    if (unit === null) globalThis.sessionStorage?.removeItem(STORAGE_KEY);
    else globalThis.sessionStorage?.setItem(STORAGE_KEY, unit);
  } catch {
    // Private browsing may refuse storage; the choice then lasts until reload.
  }
}

let state: UnitState = { studioDefault: 'in', chosen: storageRead() };
const listeners = new Set<() => void>();

function emit(next: UnitState): void {
  if (next.studioDefault === state.studioDefault && next.chosen === state.chosen) return;
  state = next;
  listeners.forEach((l) => l());
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** The unit shown now: the person's choice if they made one, else the studio's default. */
export function displayUnitGet(): DisplayUnit {
  return state.chosen ?? state.studioDefault;
}

/** Records the studio's default unit (from the signed-in member's studio). */
export function studioUnitDefaultSet(unit: DisplayUnit): void {
  emit({ ...state, studioDefault: unit });
}

/** Switches every screen to `unit`. */
export function displayUnitSet(unit: DisplayUnit): void {
  storageWrite(unit);
  emit({ ...state, chosen: unit });
}

/** Forgets the person's choice, back to the studio's default (e.g. on sign-out). */
export function displayUnitReset(): void {
  storageWrite(null);
  emit({ ...state, chosen: null });
}

/** The display unit, re-rendering when anyone switches it. */
export function useDisplayUnit(): DisplayUnit {
  return useSyncExternalStore(subscribe, displayUnitGet, displayUnitGet);
}
