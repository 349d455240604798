/**
 * The element the scene's pointer events come from: the view's own <div> when the page draws,
 * a stand-in (worker-surface.ts) when a worker draws. The drag and the hover cursor use only this,
 * so they work the same on either thread.
 */
import { useThree } from "@react-three/fiber";

export interface PointerSurface {
  readonly clientWidth: number;
  readonly clientHeight: number;
  readonly style: { setProperty(name: string, value: string): void };
  addEventListener(type: string, listener: (event: PointerEvent) => void): void;
  removeEventListener(type: string, listener: (event: PointerEvent) => void): void;
  setPointerCapture(pointerId: number): void;
  releasePointerCapture(pointerId: number): void;
  hasPointerCapture(pointerId: number): boolean;
}

/** The surface fiber's events are connected to (the canvas's parent on the page). */
export function usePointerSurface(): PointerSurface {
  return useThree((state) => (state.events.connected ?? state.gl.domElement) as PointerSurface);
}
