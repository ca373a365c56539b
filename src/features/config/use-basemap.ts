// The basemap a person has picked, remembered in this browser (localStorage) and shared by every
// map on every screen: one of the installation's web basemaps, or none (the farm's own relief).
import { useCallback, useSyncExternalStore } from 'react';
import type { Basemap } from '../../../shared/schemas/config';
import { useConfig } from './api/get-config';

const STORAGE_KEY = 'fieldshed.basemap';
/** The choice meaning "no web basemap". */
export const NO_BASEMAP = 'none';

const listeners = new Set<() => void>();
/** The choice for this page's life when the browser keeps no storage. */
let unstoredChoice: string | null = null;

function readChoice(): string | null {
  try {
    return window.localStorage.getItem(STORAGE_KEY);
  } catch {
    return unstoredChoice;
  }
}

function subscribe(onChange: () => void) {
  listeners.add(onChange);
  window.addEventListener('storage', onChange);
  return () => {
    listeners.delete(onChange);
    window.removeEventListener('storage', onChange);
  };
}

export type BasemapChoice = {
  /** What the installation offers, the default first. */
  basemaps: Basemap[];
  /** The base to draw, or null for none. */
  basemap: Basemap | null;
  /** The picked key, or NO_BASEMAP. */
  chosenKey: string;
  choose: (key: string) => void;
};

export function useBasemap(): BasemapChoice {
  const config = useConfig();
  const stored = useSyncExternalStore(subscribe, readChoice, () => null);
  const basemaps = config.data?.basemaps ?? [];
  const basemap = stored === NO_BASEMAP ? null : (basemaps.find((b) => b.key === stored) ?? basemaps[0] ?? null);
  const choose = useCallback((key: string) => {
    unstoredChoice = key;
    try {
      window.localStorage.setItem(STORAGE_KEY, key);
    } catch {
      // storage switched off: kept until the page is closed
    }
    listeners.forEach((l) => l());
  }, []);
  return { basemaps, basemap, chosenKey: basemap?.key ?? NO_BASEMAP, choose };
}
