import { Co2WeekChart } from "@/components/air/co2-week-chart";
import { db } from "@/db/client";
import { schoolCo2Week } from "@/lib/co2/repository";

/** The school's CO2 over its last school week with readings, as a chart and a table. */
export async function Co2Week({ school }: { school?: string }) {
  if (!school) return null;
  return <Co2WeekChart week={await schoolCo2Week(db(), school)} />;
}
