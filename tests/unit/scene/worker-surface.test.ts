import { describe, expect, it } from "vitest";
import { toForwardedEvent, type ForwardedPointerEvent } from "../../../components/scene/worker-protocol";
import { WorkerSurface } from "../../../components/scene/worker-surface";

const rect = { left: 100, top: 250 } as DOMRect;

function pointer(type: string, fields: Partial<PointerEvent> = {}): PointerEvent {
  return {
    type,
    pointerId: 7,
    pointerType: "mouse",
    isPrimary: true,
    button: 0,
    buttons: 1,
    clientX: 160,
    clientY: 300,
    pageX: 160,
    pageY: 1300,
    altKey: false,
    ctrlKey: false,
    metaKey: false,
    shiftKey: true,
    ...fields,
  } as PointerEvent;
}

describe("the page's pointer events, forwarded to the 3D view's worker", () => {
  it("measures offsets from the view's corner, and keeps what picking and the orbit controls read", () => {
    const forwarded = toForwardedEvent(pointer("pointermove"), rect);
    expect(forwarded).toMatchObject({
      type: "pointermove",
      pointerId: 7,
      offsetX: 60,
      offsetY: 50,
      clientX: 160,
      pageY: 1300,
      shiftKey: true,
      deltaY: 0,
    });
    // Everything in it survives a structured clone (no functions, no DOM objects).
    expect(structuredClone(forwarded)).toEqual(forwarded);
  });

  it("carries a wheel's deltas, with a pointer id where a wheel event has none", () => {
    const wheel = {
      type: "wheel",
      button: 0,
      buttons: 0,
      clientX: 100,
      clientY: 250,
      pageX: 100,
      pageY: 250,
      deltaX: 0,
      deltaY: 120,
      deltaMode: 0,
      altKey: false,
      ctrlKey: true,
      metaKey: false,
      shiftKey: false,
    } as WheelEvent;
    expect(toForwardedEvent(wheel, rect)).toMatchObject({
      type: "wheel",
      pointerId: 1,
      pointerType: "mouse",
      deltaY: 120,
      offsetX: 0,
      offsetY: 0,
      ctrlKey: true,
    });
  });
});

describe("the worker's stand-in for the view's element", () => {
  const forwarded = (type: string): ForwardedPointerEvent => toForwardedEvent(pointer(type), rect);

  it("hands each forwarded event to the listeners of its type, as coming from itself", () => {
    const surface = new WorkerSurface(() => {});
    const seen: string[] = [];
    const onMove = (event: PointerEvent) =>
      seen.push(`${event.type}@${event.offsetX},${event.offsetY}:${(event.target as unknown) === surface}`);
    surface.addEventListener("pointermove", onMove);
    surface.dispatch(forwarded("pointermove"));
    surface.dispatch(forwarded("pointerdown"));
    surface.removeEventListener("pointermove", onMove);
    surface.dispatch(forwarded("pointermove"));
    expect(seen).toEqual(["pointermove@60,50:true"]);
  });

  it("is its own document, so the orbit controls' listeners for a drag hear the same events", () => {
    const surface = new WorkerSurface(() => {});
    let heard = 0;
    surface.ownerDocument.addEventListener("pointerup", () => heard++);
    surface.dispatch(forwarded("pointerup"));
    expect(heard).toBe(1);
  });

  it("keeps a pointer captured until it is let go, and lets listeners see the capture on the way", () => {
    const surface = new WorkerSurface(() => {});
    let capturedDuringUp: boolean | null = null;
    surface.addEventListener("pointerup", (event) => (capturedDuringUp = surface.hasPointerCapture(event.pointerId)));
    surface.setPointerCapture(7);
    expect(surface.hasPointerCapture(7)).toBe(true);
    surface.dispatch(forwarded("pointerup"));
    expect(capturedDuringUp).toBe(true);
    expect(surface.hasPointerCapture(7)).toBe(false);
  });

  it("posts the cursor the scene asks for, and sizes itself as the page says", () => {
    const cursors: string[] = [];
    const surface = new WorkerSurface((cursor) => cursors.push(cursor));
    surface.style.setProperty("cursor", "grab");
    surface.style.setProperty("touch-action", "none");
    surface.style.setProperty("cursor", "");
    expect(cursors).toEqual(["grab", ""]);
    surface.resize(640, 480);
    expect([surface.clientWidth, surface.clientHeight]).toEqual([640, 480]);
    expect(surface.getBoundingClientRect()).toMatchObject({ left: 0, top: 0, width: 640, height: 480 });
  });
});
