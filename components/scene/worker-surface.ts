/**
 * Inside the worker, the stand-in for the view's element: fiber's events and the orbit controls
 * listen here, and the page's forwarded pointer events are dispatched here. Pointer capture is the
 * page's (it captures on every press), so here it is only remembered; a cursor is posted back.
 */
import type { ForwardedPointerEvent } from "./worker-protocol";
import type { PointerSurface } from "./pointer-surface";

type Listener = (event: PointerEvent) => void;

export class WorkerSurface implements PointerSurface {
  clientWidth = 0;
  clientHeight = 0;
  readonly style: { touchAction?: string; setProperty(name: string, value: string): void };
  /** The orbit controls follow a drag on the element's document; here that is the surface itself. */
  readonly ownerDocument = this;
  /** When the event being handled happened (ms since the epoch): what a drag it causes answers to. */
  lastEventAtMs = Number.NaN;
  private readonly listeners = new Map<string, Set<Listener>>();
  private readonly captured = new Set<number>();

  constructor(onCursor: (cursor: string) => void) {
    this.style = {
      setProperty(name, value) {
        if (name === "cursor") onCursor(value);
      },
    };
  }

  resize(width: number, height: number): void {
    this.clientWidth = width;
    this.clientHeight = height;
  }

  getBoundingClientRect(): {
    left: number;
    top: number;
    right: number;
    bottom: number;
    x: number;
    y: number;
    width: number;
    height: number;
  } {
    const width = this.clientWidth;
    const height = this.clientHeight;
    return { left: 0, top: 0, right: width, bottom: height, x: 0, y: 0, width, height };
  }

  addEventListener(type: string, listener: Listener): void {
    let forType = this.listeners.get(type);
    if (!forType) this.listeners.set(type, (forType = new Set()));
    forType.add(listener);
  }

  removeEventListener(type: string, listener: Listener): void {
    this.listeners.get(type)?.delete(listener);
  }

  setPointerCapture(pointerId: number): void {
    this.captured.add(pointerId);
  }

  releasePointerCapture(pointerId: number): void {
    this.captured.delete(pointerId);
  }

  hasPointerCapture(pointerId: number): boolean {
    return this.captured.has(pointerId);
  }

  focus(): void {}

  dispatch(forwarded: ForwardedPointerEvent): void {
    this.lastEventAtMs = forwarded.atMs;
    const event = {
      ...forwarded,
      target: this,
      currentTarget: this,
      preventDefault() {},
      stopPropagation() {},
    } as unknown as PointerEvent;
    // As on an element: one listener that throws is reported, and the others still hear the event.
    for (const listener of [...(this.listeners.get(forwarded.type) ?? [])]) {
      try {
        listener(event);
      } catch (error) {
        reportError(error);
      }
    }
    if (forwarded.type === "pointerup" || forwarded.type === "pointercancel") this.captured.delete(forwarded.pointerId);
  }
}
