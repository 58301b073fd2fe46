import "server-only";
import { sharedDatabase } from "./shared";

/** The database for pages, route handlers and server actions. */
export const db = sharedDatabase;
