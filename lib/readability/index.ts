export * from "./flesch-kincaid";
