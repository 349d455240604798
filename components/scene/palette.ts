/** Trimrail's scene colours (shared/look.md). Flag colours are a second cue after shape and word. */
export const PAPER = "#f5f3ee";
export const INK = "#14202e";
export const ACCENT = "#1d7f7a";
export const ACCENT_DARK = "#155f5b";
export const FABRIC = "#d9dcdf";
export const FIN_FABRIC = "#b9bec3";
export const SEAM = "#8e959c";
export const RAIL = "#5b6672";
export const RAIL_TAB = "#7b848d";
export const PAYLOAD = "#3d4a57";
export const LINE = "#4a5560";
export const GROUND = "#ebe7de";
export const GRID_MAJOR = "#d9d5cc";
export const GRID_MINOR = "#e4e0d7";
export const BUOYANCY = "#2f5d8a";
export const FLAG_COLOURS = { ok: "#2e7d4f", caution: "#8f5b0a", stop: "#b83232" } as const;
