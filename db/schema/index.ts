export * from "./shop";
export * from "./catalog";
export * from "./auth";
export * from "./audit";
export * from "./fit-cards";
export * from "./email";
export * from "./quotes";
export * from "./rate-limit";
