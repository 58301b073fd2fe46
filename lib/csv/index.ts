export * from "./parse";
export * from "./write";
