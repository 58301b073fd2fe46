export * from "./layout";
export * from "./plan-svg";
