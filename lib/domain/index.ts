export * from "./attachments";
export * from "./catalogue";
export * from "./flags";
export * from "./roles";
export * from "./setups";
export * from "./input-limits";
export * from "./workflow";
export * from "./lift-check";
