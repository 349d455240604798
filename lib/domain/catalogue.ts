// The catalogue's words: screw threads of mounts and adapters, how a payload attaches, what it is
// and the shape it is drawn and checked as.

export const THREADS = ["1/4-20 UNC", "3/8-16 UNC"] as const;
export type Thread = (typeof THREADS)[number];

/** A payload screws on with one of the threads or is strapped to an adapter. */
export const ATTACHMENTS = [...THREADS, "strap"] as const;
export type Attachment = (typeof ATTACHMENTS)[number];

export const PAYLOAD_CATEGORIES = ["antenna", "camera", "sensor", "radio", "light", "other"] as const;
export type PayloadCategory = (typeof PAYLOAD_CATEGORIES)[number];

export const PAYLOAD_SHAPES = ["box", "cylinder", "rod"] as const;
export type PayloadShape = (typeof PAYLOAD_SHAPES)[number];
