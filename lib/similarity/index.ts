export * from "./score";
export * from "./rank-similar";
export * from "./weights";
export { sharedWords } from "./shared-words";
export * from "./labels";
