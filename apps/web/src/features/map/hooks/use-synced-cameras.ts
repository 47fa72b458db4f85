import type { Map as MapLibreMap } from 'maplibre-gl';
import { useCallback, useEffect, useRef, useState } from 'react';

/**
 * Keeps two maps looking at the same place: whichever the user moves, the other follows.
 * @returns `onReady` callbacks to pass to the two MapCanvas components
 * @example const { leftReady, rightReady } = useSyncedCameras(); <MapCanvas onMapReady={leftReady} … />
 */
export function useSyncedCameras() {
  const [left, setLeft] = useState<MapLibreMap | null>(null);
  const [right, setRight] = useState<MapLibreMap | null>(null);
  const following = useRef(false);

  useEffect(() => {
    if (!left || !right) return;
    const follow = (from: MapLibreMap, to: MapLibreMap) => () => {
      // The follower's own move event would echo back; ignore moves we caused.
      if (following.current) return;
      following.current = true;
      to.jumpTo({ center: from.getCenter(), zoom: from.getZoom(), bearing: from.getBearing(), pitch: from.getPitch() });
      following.current = false;
    };
    const leftMoved = follow(left, right);
    const rightMoved = follow(right, left);
    left.on('move', leftMoved);
    right.on('move', rightMoved);
    leftMoved();
    return () => {
      left.off('move', leftMoved);
      right.off('move', rightMoved);
    };
  }, [left, right]);

  return { leftReady: useCallback((m: MapLibreMap | null) => setLeft(m), []), rightReady: useCallback((m: MapLibreMap | null) => setRight(m), []) };
}
