// True on a phone-width screen (under Tailwind's `sm`, 640 px), where wide tables become cards
// and the farm map fills the screen. Follows the window as it turns or resizes.
import { useSyncExternalStore } from 'react';

const NARROW = '(max-width: 639.98px)';

function subscribe(onChange: () => void): () => void {
  const query = window.matchMedia(NARROW);
  query.addEventListener('change', onChange);
  return () => query.removeEventListener('change', onChange);
}

export const useNarrowScreen = (): boolean => useSyncExternalStore(subscribe, () => window.matchMedia(NARROW).matches);
