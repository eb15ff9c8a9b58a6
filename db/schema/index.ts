export * from "./auth";
export * from "./shops";
export * from "./presses";
export * from "./audit";
export * from "./rate-limits";
export * from "./components";
export * from "./photos";
