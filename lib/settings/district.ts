import { z } from "zod";
import type { DB } from "@/db/connection";
import { getSetting } from "./repository";

export const DEFAULT_DISTRICT_NAME = "Wrenmoor Valley School District";

export function districtName(db: DB): Promise<string> {
  return getSetting(db, "district_name", z.string().min(2).max(120), DEFAULT_DISTRICT_NAME);
}
