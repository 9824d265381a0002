export * from "./shop";
