export * from "./shop";
export * from "./catalog";
export * from "./auth";
