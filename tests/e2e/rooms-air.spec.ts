import { expect, test, type Page } from "@playwright/test";
import { DEMO_ACCOUNTS, signInThroughApi, signInThroughPage } from "./support/staff";

// Rooms and CO2 readings: the browser import with its preview, the room form, the
// seating plan, the public Fresh air page and the rooms API. These tests change
// Tamsin Creek's and Eastmere's rooms; they run in order on one seeded database.
test.describe.configure({ mode: "serial" });

const HEADER = "school,room,use,length_ft,width_ft,ceiling_ft,occupancy,outdoor_air_cfm,air_cleaners,cadr_cfm_each,merv,windows_open";
const csv = (...rows: string[]) => ({ name: "rooms.csv", mimeType: "text/csv", buffer: Buffer.from([HEADER, ...rows].join("\r\n") + "\r\n") });

interface ApiRoom {
  room: string;
  use: string;
  floorAreaFt2: number;
  volumeFt3: number;
  outdoorAirCfm: number;
  airChangesPerHour: number;
  equivalentAirChangesPerHour: number;
  requiredOutdoorAirCfm: number;
  meetsOutdoorAirRate: boolean;
  minutesTo99: number | null;
  minutesTo999: number | null;
  seats: { spacingFt: number; count: number; layout: string };
  co2: { day: string; meanPpm: number; peakPpm: number; minutesAbove: number } | null;
}

async function apiRooms(page: Page, school: string): Promise<ApiRoom[]> {
  const response = await page.request.get(`/api/schools/${school}/rooms`);
  expect(response.status()).toBe(200);
  const body = (await response.json()) as { school: string; rooms: ApiRoom[] };
  expect(body.school).toBe(school);
  return body.rooms;
}

/** As the page shows a duration: "54 min", "3 h 23 min". */
function minutes(value: number): string {
  const m = Math.round(value);
  return m < 60 ? `${m} min` : m % 60 === 0 ? `${Math.floor(m / 60)} h` : `${Math.floor(m / 60)} h ${m % 60} min`;
}

const oneDecimal = (n: number) => n.toLocaleString("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });

test("a communications user gets 403 from the import and export route handlers, and nothing changes", async ({ request }) => {
  expect(await signInThroughApi(request, DEMO_ACCOUNTS.communications)).toBe(200);
  const before = await (await request.get("/api/schools/tamsin-creek/rooms")).json();
  const file = csv("tamsin-creek,Room 101,classroom_5_8,30,30,9.5,22,999,0,,13,yes");
  for (const path of ["/api/staff/rooms/import", "/api/staff/rooms/import?dryRun=1"]) {
    const response = await request.post(path, { multipart: { file } });
    expect(response.status(), path).toBe(403);
    expect(await response.json()).toEqual({ error: expect.any(String) });
  }
  const co2 = await request.post("/api/staff/co2/import", {
    multipart: { file: { name: "co2.csv", mimeType: "text/csv", buffer: Buffer.from("school,room,timestamp,co2_ppm\r\ntamsin-creek,Room 101,2026-11-30T09:00:00-05:00,900\r\n") } },
  });
  expect(co2.status()).toBe(403);
  expect((await request.get("/api/staff/rooms/export")).status()).toBe(403);
  expect((await request.patch("/api/staff/rooms/1", { data: { name: "x" } })).status()).toBe(403);
  expect(await (await request.get("/api/schools/tamsin-creek/rooms")).json()).toEqual(before);
});

test("facilities imports rooms in the browser: a bad file shows its row error and saves nothing, a good file is imported and shows publicly", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  const beforeApi = await apiRooms(page, "tamsin-creek");
  const room101 = beforeApi.find((r) => r.room === "Room 101")!;
  expect(room101.outdoorAirCfm).toBe(420);

  await page.goto("/schools/tamsin-creek/air");
  const publicRow = page.getByTestId("room-figures-table").locator('tr[data-room="Room 101"]');
  await expect(publicRow.locator('[data-col="ach"]')).toHaveText(oneDecimal(room101.airChangesPerHour));

  await page.goto("/staff/rooms");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Rooms");
  const fileInput = page.getByLabel("Rooms file (CSV)");
  await fileInput.setInputFiles(
    csv(
      "tamsin-creek,Room 101,classroom_5_8,30,30,9.5,22,900,1,350,13,yes",
      "tamsin-creek,Room 109,classroom_5_8,30,-4,9.5,22,400,0,,13,yes",
    ),
  );
  await page.getByRole("button", { name: "Check the file" }).click();
  const status = page.getByTestId("room-import-status");
  await expect(status).toContainText("Nothing was imported");
  await expect(status).toContainText("1 of 2 rows need a change");
  const preview = page.getByRole("table", { name: "Preview of rooms.csv" });
  await expect(preview.getByRole("row", { name: /Room 109/ })).toContainText("width_ft: Enter a number greater than 0.");
  await expect(preview.getByRole("row", { name: /Room 101/ })).toContainText("Changes this room");
  await expect(page.getByRole("button", { name: /^Import/ })).toHaveCount(0);
  expect(await apiRooms(page, "tamsin-creek")).toEqual(beforeApi);

  await fileInput.setInputFiles(
    csv(
      "tamsin-creek,Room 101,classroom_5_8,30,30,9.5,22,900,1,350,13,yes",
      "tamsin-creek,Room 109,classroom_5_8,30,28,9.5,22,400,0,,13,yes",
      "tamsin-creek,Room 102,classroom_5_8,31,29,9.5,22,400,1,350,13,yes",
    ),
  );
  await page.getByRole("button", { name: "Check the file" }).click();
  await expect(status).toContainText("The file is good: 3 rows (feet and cfm) — 1 new rooms, 1 changed, 1 unchanged");
  await page.getByRole("button", { name: "Import 2 rooms" }).click();
  await expect(status).toContainText("✓ Imported rooms.csv: 1 rooms added, 1 changed, 1 already up to date.");
  await expect(page.getByTestId("staff-rooms-tamsin-creek").getByRole("link", { name: "Room 109" })).toBeVisible();

  const afterApi = await apiRooms(page, "tamsin-creek");
  const updated = afterApi.find((r) => r.room === "Room 101")!;
  expect(updated.outdoorAirCfm).toBe(900);
  expect(updated.airChangesPerHour).toBeCloseTo((900 * 60) / 8550, 9);
  expect(afterApi.map((r) => r.room)).toContain("Room 109");

  // The import revalidated the school's public pages: the new figures show without a rebuild.
  await page.goto("/schools/tamsin-creek/air");
  await expect(publicRow.locator('[data-col="ach"]')).toHaveText(oneDecimal(updated.airChangesPerHour));
  await expect(page.getByTestId("room-figures-table").locator('tr[data-room="Room 109"]')).toBeVisible();
  await page.goto("/schools/tamsin-creek");
  await expect(page.getByTestId("school-air-summary")).toContainText(`of ${afterApi.length} rooms`);
});

test("facilities edits one room in the form; bad input gets a message and saves nothing", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  await page.goto("/staff/rooms");
  await page.getByTestId("staff-rooms-eastmere").getByRole("link", { name: "Room A102" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Room A102");
  const form = page.getByRole("form", { name: "Edit Room A102" });

  await form.getByLabel("Floor width (ft)").fill("");
  await form.getByRole("button", { name: "Save room" }).click();
  await expect(form.getByText("Enter the floor width.")).toBeVisible();
  expect((await apiRooms(page, "eastmere")).find((r) => r.room === "Room A102")?.floorAreaFt2).toBe(35 * 27);

  await form.getByLabel("Floor width (ft)").fill("27");
  await form.getByLabel("Outdoor air (cfm)").fill("600");
  await form.getByLabel("Portable air cleaners").fill("1");
  await form.getByLabel("CADR of each air cleaner (cfm)").fill("");
  await form.getByRole("button", { name: "Save room" }).click();
  await expect(form.getByText("Enter each air cleaner's CADR (cfm), more than 0.")).toBeVisible();

  await form.getByLabel("CADR of each air cleaner (cfm)").fill("400");
  await form.getByRole("button", { name: "Save room" }).click();
  await expect(form.getByRole("status")).toHaveText("Room A102: saved. The school's public Fresh air page shows the new figures.");
  const saved = (await apiRooms(page, "eastmere")).find((r) => r.room === "Room A102")!;
  expect(saved.outdoorAirCfm).toBe(600);
  expect(saved.equivalentAirChangesPerHour).toBeCloseTo(((600 + 400) * 60) / (35 * 27 * 10), 9);
  await page.reload();
  await expect(page.getByLabel("Outdoor air (cfm)")).toHaveValue("600");
  await expect(page.getByTestId("room-ach")).toContainText(`${(((600 + 400) * 60) / (35 * 27 * 10)).toFixed(2)} equivalent`);

  // Metric entry is converted: 283.17 L/s is 600 cfm.
  await form.getByLabel("Metres and litres per second").check();
  await expect(page.getByLabel("Outdoor air (L/s)")).toHaveValue("283.168");
  await expect(page.getByLabel("Floor length (m)")).toHaveValue("10.668");

  await page.goto("/schools/eastmere/air");
  await expect(page.getByTestId("room-figures-table").locator('tr[data-room="Room A102"] [data-col="eq-ach"]')).toHaveText(oneDecimal(saved.equivalentAirChangesPerHour));
});

test("the seating plan redraws for the 3 ft preset and names its seat count in words", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  await page.goto("/staff/rooms");
  await page.getByTestId("staff-rooms-tamsin-creek").getByRole("link", { name: "Room 101" }).click();
  const count = page.getByTestId("seat-count");
  await expect(count).toHaveText("20 desks fit 6 ft apart in straight rows.");
  const plan = page.getByRole("img", { name: /Seating plan for Room 101 at 6 ft/ });
  await expect(plan).toBeVisible();
  await expect(plan.locator("desc")).toContainText("20 desks (each 2 by 2.5 feet) in straight rows");
  await page.getByRole("button", { name: "3 ft apart" }).click();
  await expect(count).toContainText("3 ft apart");
  await expect(page.getByRole("img", { name: /Seating plan for Room 101 at 3 ft/ })).toBeVisible();
  await page.getByLabel("Spacing, centre to centre (ft)").fill("abc");
  await expect(page.getByText("! Enter 1 to 20 ft.")).toBeVisible();
  await expect(count).toContainText("3 ft apart");
});

test("facilities uploads a CO2 log; the same file again adds nothing; the public chart shows the day", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  await page.goto("/staff/readings");
  const lines = ["school,room,timestamp,co2_ppm"];
  for (let m = 8 * 60; m < 15 * 60; m += 10) {
    const hh = String(Math.floor(m / 60)).padStart(2, "0");
    const mm = String(m % 60).padStart(2, "0");
    lines.push(`eastmere,Room A103,2026-12-01T${hh}:${mm}:00-05:00,${m < 600 ? 800 : 1250}`);
  }
  const file = { name: "a103-tuesday.csv", mimeType: "text/csv", buffer: Buffer.from(lines.join("\n")) };
  const status = page.getByTestId("co2-upload-status");
  await page.getByLabel("Sensor log (CSV)").setInputFiles(file);
  await page.getByRole("button", { name: "Upload readings" }).click();
  await expect(status).toContainText("42 readings read, 42 added, 0 already stored and ignored. Daily figures updated for 1 room-days.");
  await page.getByLabel("Sensor log (CSV)").setInputFiles(file);
  await page.getByRole("button", { name: "Upload readings" }).click();
  await expect(status).toContainText("42 readings read, 0 added, 42 already stored and ignored.");

  await page.getByLabel("Sensor log (CSV)").setInputFiles({ name: "bad.csv", mimeType: "text/csv", buffer: Buffer.from("school,room,timestamp,co2_ppm\neastmere,Room A103,yesterday,900\n") });
  await page.getByRole("button", { name: "Upload readings" }).click();
  await expect(status).toContainText("Nothing was saved.");
  await expect(status).toContainText("Line 2, timestamp: “yesterday” is not a date and time with an offset");

  const a103 = (await apiRooms(page, "eastmere")).find((r) => r.room === "Room A103")!;
  // 08:00–10:00 at 800 (120 min), 10:00–15:00 at 1,250 (300 min).
  expect(a103.co2).toEqual({ day: "2026-12-01", meanPpm: expect.closeTo((120 * 800 + 300 * 1250) / 420, 6), peakPpm: 1250, minutesAbove: expect.closeTo(300, 6) });
  await page.goto("/schools/eastmere/air");
  await expect(page.getByTestId("room-figures-table").locator('tr[data-room="Room A103"] [data-col="co2"]')).toContainText("peak 1,250 ppm average 1,121 ppm Tue, Dec 1");
  await expect(page.getByRole("img", { name: /^Room A103: highest reading each day from 1,250 to 1,250 ppm/ })).toBeVisible();
  await page.getByText("Show the chart's numbers as a table").click();
  await expect(page.getByRole("table", { name: /Highest and average CO2/ }).getByRole("row", { name: /Room A103/ })).toContainText("highest 1,250");
});

test("the rooms API answers the same figures as the public table", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  for (const school of ["corrow-ridge", "tamsin-creek"]) {
    const rooms = await apiRooms(page, school);
    expect(rooms.length).toBeGreaterThanOrEqual(12);
    await page.goto(`/schools/${school}/air`);
    const table = page.getByTestId("room-figures-table");
    await expect(table.locator("tbody tr")).toHaveCount(rooms.length);
    for (const r of rooms) {
      const row = table.locator(`tr[data-room="${r.room}"]`);
      await expect(row.locator('[data-col="ach"]')).toHaveText(oneDecimal(r.airChangesPerHour));
      await expect(row.locator('[data-col="eq-ach"]')).toHaveText(oneDecimal(r.equivalentAirChangesPerHour));
      await expect(row.locator('[data-col="meets"]')).toContainText(r.meetsOutdoorAirRate ? "Yes" : "No");
      await expect(row.locator('[data-col="minutes-99"]')).toHaveText(r.minutesTo99 === null ? "—" : minutes(r.minutesTo99));
      await expect(row.locator('[data-col="seats"]')).toHaveText(String(r.seats.count));
      await expect(row.locator('[data-col="co2"]')).toContainText(r.co2 ? `peak ${Math.round(r.co2.peakPpm).toLocaleString("en-US")}` : "No readings yet");
      expect(r.seats.spacingFt).toBe(6);
    }
  }
  const missing = await page.request.get("/api/schools/no-such-school/rooms");
  expect(missing.status()).toBe(404);
  expect(await missing.json()).toEqual({ error: expect.any(String) });
});

test("facilities exports the rooms as CSV in US units", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  const response = await page.request.get("/api/staff/rooms/export?school=tamsin-creek");
  expect(response.status()).toBe(200);
  expect(response.headers()["content-type"]).toMatch(/^text\/csv/);
  const lines = (await response.text()).trim().split("\r\n");
  expect(lines[0]).toBe(HEADER);
  expect(lines).toContain("tamsin-creek,Room 101,classroom_5_8,30,30,9.5,22,900,1,350,13,yes");
  expect(lines.every((l, i) => i === 0 || l.startsWith("tamsin-creek,"))).toBe(true);
  expect((await page.request.get("/api/staff/rooms/export?school=nowhere")).status()).toBe(404);
});

test("facilities removes a room after a second step; its readings go with it and the public page no longer lists it", async ({ page }) => {
  await signInThroughPage(page, DEMO_ACCOUNTS.facilities);
  const created = await page.request.post("/api/staff/rooms", {
    data: { school: "tamsin-creek", name: "Room 950", use: "office", units: "us", length: 12, width: 10, ceiling: 9, occupancy: 2, outdoorAir: 60, airCleaners: 0, merv: null, windowsOpen: true },
  });
  expect(created.status(), await created.text()).toBe(201);
  const { room } = (await created.json()) as { room: { id: number } };
  const log = ["school,room,timestamp,co2_ppm", ...[8, 9, 10, 11, 12, 13].map((h) => `tamsin-creek,Room 950,2026-12-01T${String(h).padStart(2, "0")}:00:00-05:00,700`)].join("\n");
  const imported = await page.request.post("/api/staff/co2/import", { multipart: { file: { name: "room-950.csv", mimeType: "text/csv", buffer: Buffer.from(log) } } });
  expect(imported.status(), await imported.text()).toBe(200);
  await page.goto("/schools/tamsin-creek/air");
  await expect(page.getByTestId("room-figures-table").locator('tr[data-room="Room 950"]')).toHaveCount(1);

  await page.goto(`/staff/rooms/${room.id}`);
  const opener = page.getByRole("button", { name: "Remove this room…" });
  await opener.click();
  const confirm = page.getByRole("group", { name: "Remove Room 950?" });
  await expect(confirm).toBeFocused();
  await expect(confirm).toContainText("its 6 CO2 readings over 1 school day go with it");
  // Cancel changes nothing and gives the focus back.
  await confirm.getByRole("button", { name: "Cancel" }).click();
  await expect(opener).toBeFocused();
  expect((await page.request.get(`/api/staff/rooms/${room.id}`)).status()).toBe(200);

  await opener.click();
  await page.getByRole("button", { name: "Remove the room" }).click();
  await expect(page).toHaveURL(/\/staff\/rooms\?removed=/);
  await expect(page.getByTestId("room-removed")).toContainText("Removed: Room 950, Tamsin Creek Elementary School");
  await expect(page.getByTestId("staff-rooms-tamsin-creek").getByRole("link", { name: "Room 950" })).toHaveCount(0);
  expect((await page.request.get(`/api/staff/rooms/${room.id}`)).status()).toBe(404);
  expect((await apiRooms(page, "tamsin-creek")).map((r) => r.room)).not.toContain("Room 950");
  await page.goto("/schools/tamsin-creek/air");
  await expect(page.getByTestId("room-figures-table").locator('tr[data-room="Room 950"]')).toHaveCount(0);
});
