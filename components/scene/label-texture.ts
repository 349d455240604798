/**
 * Marker and label textures drawn on a 2D canvas with the system font: no font files are fetched
 * at run time. Cached per content, so re-renders never redraw them. An OffscreenCanvas where
 * there is no document (in the worker that draws the view).
 */
import { CanvasTexture, SRGBColorSpace } from "three";
import { ACCENT, BUOYANCY, INK } from "./palette";

export type MarkerKind = "buoyancy" | "mass" | "tether";

const TEXTURE_HEIGHT_PX = 128;
type LabelTexture = CanvasTexture<HTMLCanvasElement | OffscreenCanvas>;
const cache = new Map<string, LabelTexture>();

type Context2D = CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D;

function drawingCanvas(widthPx: number, heightPx: number): HTMLCanvasElement | OffscreenCanvas {
  if (typeof document === "undefined") return new OffscreenCanvas(widthPx, heightPx);
  const canvas = document.createElement("canvas");
  canvas.width = widthPx;
  canvas.height = heightPx;
  return canvas;
}

function canvasTexture(key: string, widthPx: number, draw: (ctx: Context2D) => void): LabelTexture {
  const cached = cache.get(key);
  if (cached) return cached;
  const canvas = drawingCanvas(widthPx, TEXTURE_HEIGHT_PX);
  const ctx = canvas.getContext("2d") as Context2D | null;
  if (ctx) draw(ctx);
  const texture = new CanvasTexture(canvas);
  texture.colorSpace = SRGBColorSpace;
  texture.anisotropy = 4;
  cache.set(key, texture);
  return texture;
}

function letter(ctx: Context2D, text: string, colour: string): void {
  ctx.font = "700 84px ui-sans-serif, system-ui, sans-serif";
  ctx.textBaseline = "middle";
  ctx.textAlign = "left";
  // A paper halo keeps the letter legible over the envelope and the lines.
  ctx.lineWidth = 14;
  ctx.strokeStyle = "rgba(245,243,238,0.92)";
  ctx.strokeText(text, 136, 68);
  ctx.fillStyle = colour;
  ctx.fillText(text, 136, 68);
}

/** Shape on the left half (centre at u = 0.25), letter on the right: the shape carries the meaning. */
export function markerTexture(kind: MarkerKind): LabelTexture {
  return canvasTexture(`marker:${kind}`, 2 * TEXTURE_HEIGHT_PX, (ctx) => {
    const c = 64;
    const r = 46;
    ctx.fillStyle = "rgba(245,243,238,0.9)";
    if (kind === "buoyancy") {
      // Hollow ring.
      ctx.beginPath();
      ctx.arc(c, c, r + 6, 0, 2 * Math.PI);
      ctx.fill();
      ctx.beginPath();
      ctx.arc(c, c, r - 7, 0, 2 * Math.PI);
      ctx.lineWidth = 14;
      ctx.strokeStyle = BUOYANCY;
      ctx.stroke();
      letter(ctx, "B", BUOYANCY);
    } else if (kind === "mass") {
      // Filled quartered disc: alternate ink and paper quadrants inside an ink rim.
      ctx.beginPath();
      ctx.arc(c, c, r + 4, 0, 2 * Math.PI);
      ctx.fill();
      for (let q = 0; q < 4; q++) {
        ctx.beginPath();
        ctx.moveTo(c, c);
        ctx.arc(c, c, r - 2, (q * Math.PI) / 2 - Math.PI / 2, ((q + 1) * Math.PI) / 2 - Math.PI / 2);
        ctx.closePath();
        ctx.fillStyle = q % 2 === 0 ? INK : "#f5f3ee";
        ctx.fill();
      }
      ctx.beginPath();
      ctx.arc(c, c, r - 2, 0, 2 * Math.PI);
      ctx.lineWidth = 6;
      ctx.strokeStyle = INK;
      ctx.stroke();
      letter(ctx, "M", INK);
    } else {
      // Small diamond.
      const d = 34;
      ctx.beginPath();
      ctx.moveTo(c, c - d - 6);
      ctx.lineTo(c + d + 6, c);
      ctx.lineTo(c, c + d + 6);
      ctx.lineTo(c - d - 6, c);
      ctx.closePath();
      ctx.fill();
      ctx.beginPath();
      ctx.moveTo(c, c - d);
      ctx.lineTo(c + d, c);
      ctx.lineTo(c, c + d);
      ctx.lineTo(c - d, c);
      ctx.closePath();
      ctx.fillStyle = ACCENT;
      ctx.fill();
      letter(ctx, "T", INK);
    }
  });
}

/** A short text label (e.g. the wind speed), ink on a paper pill; width in texture pixels. */
export function textTexture(text: string): { texture: LabelTexture; aspect: number } {
  const widthPx = Math.min(1024, Math.max(128, Math.ceil((text.length * 44 + 48) / 64) * 64));
  const texture = canvasTexture(`text:${text}`, widthPx, (ctx) => {
    ctx.fillStyle = "rgba(245,243,238,0.92)";
    ctx.beginPath();
    ctx.roundRect(4, 24, widthPx - 8, 80, 40);
    ctx.fill();
    ctx.font = "600 64px ui-sans-serif, system-ui, sans-serif";
    ctx.textBaseline = "middle";
    ctx.textAlign = "center";
    ctx.fillStyle = INK;
    ctx.fillText(text, widthPx / 2, 66);
  });
  return { texture, aspect: widthPx / TEXTURE_HEIGHT_PX };
}
