// A ref that always holds the latest value: lets an event listener registered once call
// the current handler instead of the one from the render that registered it.
import { useLayoutEffect, useRef } from 'react';

export function useLatest<T>(value: T) {
  const ref = useRef(value);
  useLayoutEffect(() => {
    ref.current = value;
  });
  return ref;
}
