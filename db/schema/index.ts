export * from "./shop";
export * from "./catalog";
