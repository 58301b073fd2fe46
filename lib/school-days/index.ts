export * from "./calendar";
