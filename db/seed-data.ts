import type { Role, SchoolLevel } from "./types";

/** The invented demo district. Every name here is made up. */
export const DEMO_DISTRICT = "Wrenmoor Valley School District";
export const DEMO_PASSWORD = "clearhall-demo";

export interface SeedSchool {
  slug: string;
  name: string;
  level: SchoolLevel;
  grades: string;
  address: string;
  phone: string;
  rooms: SeedRoom[];
}

export interface SeedRoom {
  name: string;
  use: string;
  lengthFt: number;
  widthFt: number;
  ceilingFt: number;
  occupancy: number;
}

function classrooms(prefix: string, count: number, use: string, size: [number, number, number], occupancy: number): SeedRoom[] {
  return Array.from({ length: count }, (_, i) => ({
    name: `${prefix}${String(i + 1).padStart(2, "0")}`,
    use,
    lengthFt: size[0] + (i % 3),
    widthFt: size[1] - (i % 2),
    ceilingFt: size[2],
    occupancy: occupancy + (i % 3) - 1,
  }));
}

export const SEED_SCHOOLS: SeedSchool[] = [
  {
    slug: "tamsin-creek",
    name: "Tamsin Creek Elementary School",
    level: "elementary",
    grades: "K–5",
    address: "140 Millrace Lane, Wrenmoor",
    phone: "555-0141",
    rooms: [
      ...classrooms("Room 1", 8, "classroom_5_8", [30, 30, 9.5], 22),
      { name: "Room 201", use: "classroom_9_plus", lengthFt: 32, widthFt: 28, ceilingFt: 9.5, occupancy: 25 },
      { name: "Library", use: "lecture", lengthFt: 48, widthFt: 36, ceilingFt: 12, occupancy: 40 },
      { name: "Gym", use: "gym", lengthFt: 80, widthFt: 60, ceilingFt: 22, occupancy: 60 },
      { name: "Main office", use: "office", lengthFt: 24, widthFt: 18, ceilingFt: 9, occupancy: 5 },
    ],
  },
  {
    slug: "corrow-ridge",
    name: "Corrow Ridge Middle School",
    level: "middle",
    grades: "6–8",
    address: "2200 Ridgeback Road, Wrenmoor",
    phone: "555-0162",
    rooms: [
      ...classrooms("Room 1", 5, "classroom_9_plus", [32, 28, 10], 26),
      ...classrooms("Room 2", 3, "classroom_9_plus", [30, 30, 9], 27),
      { name: "Science lab A", use: "science_lab", lengthFt: 40, widthFt: 30, ceilingFt: 10, occupancy: 24 },
      { name: "Science lab B", use: "science_lab", lengthFt: 40, widthFt: 30, ceilingFt: 10, occupancy: 24 },
      { name: "Gym", use: "gym", lengthFt: 96, widthFt: 72, ceilingFt: 24, occupancy: 80 },
      { name: "Main office", use: "office", lengthFt: 26, widthFt: 20, ceilingFt: 9, occupancy: 6 },
    ],
  },
  {
    slug: "eastmere",
    name: "Eastmere High School",
    level: "high",
    grades: "9–12",
    address: "75 Harbour Field Drive, Wrenmoor",
    phone: "555-0183",
    rooms: [
      ...classrooms("Room A1", 6, "classroom_9_plus", [34, 28, 10], 28),
      { name: "Lecture hall", use: "lecture", lengthFt: 60, widthFt: 44, ceilingFt: 16, occupancy: 120 },
      { name: "Chemistry lab", use: "science_lab", lengthFt: 42, widthFt: 32, ceilingFt: 11, occupancy: 26 },
      { name: "Biology lab", use: "science_lab", lengthFt: 42, widthFt: 30, ceilingFt: 11, occupancy: 26 },
      { name: "Physics lab", use: "science_lab", lengthFt: 40, widthFt: 30, ceilingFt: 11, occupancy: 24 },
      { name: "Gym", use: "gym", lengthFt: 110, widthFt: 84, ceilingFt: 26, occupancy: 120 },
      { name: "Main office", use: "office", lengthFt: 30, widthFt: 22, ceilingFt: 9, occupancy: 8 },
    ],
  },
];

export interface SeedUser {
  email: string;
  name: string;
  role: Role;
}

export const SEED_USERS: SeedUser[] = [
  { email: "comms@example.org", name: "Priya Vandermolen", role: "communications" },
  { email: "facilities@example.org", name: "Dana Okafor-Reyes", role: "facilities" },
  { email: "admin@example.org", name: "Tomasz Ellery-Byrne", role: "admin" },
];

export interface SeedQuestion {
  reference: string;
  school: string | null;
  topic: string;
  room: string | null;
  body: string;
  askerName: string | null;
  askerEmail: string;
  language: string;
  receivedAt: string;
}

export const SEED_QUESTIONS: SeedQuestion[] = [
  {
    reference: "Q-2026-0001",
    school: "tamsin-creek",
    topic: "air",
    room: "Room 104",
    body: "Does my son's classroom get fresh air from outside, or is the same air just going round? The windows always look closed when I drop him off.",
    askerName: "Marisol Quenby",
    askerEmail: "marisol.quenby@example.net",
    language: "en",
    receivedAt: "2026-11-23T14:05:00.000Z",
  },
  {
    reference: "Q-2026-0002",
    school: "corrow-ridge",
    topic: "cleaning",
    room: null,
    body: "What do the cleaning crews spray in the classrooms at night? My daughter has asthma and I want to know if it is safe for her the next morning.",
    askerName: null,
    askerEmail: "h.adeyemi-lusk@example.net",
    language: "en",
    receivedAt: "2026-11-24T09:40:00.000Z",
  },
  {
    reference: "Q-2026-0003",
    school: "eastmere",
    topic: "building",
    room: null,
    body: "If the power goes out during a storm, does the new generator keep the whole school running, including the heating?",
    askerName: "Jonah Perrault",
    askerEmail: "jonah.perrault@example.net",
    language: "en",
    receivedAt: "2026-11-25T16:20:00.000Z",
  },
  {
    reference: "Q-2026-0004",
    school: null,
    topic: "cases",
    room: null,
    body: "If a child in my son's class tests positive, how will I find out and will the whole class have to stay home?",
    askerName: "Ines Holloway",
    askerEmail: "ines.holloway@example.net",
    language: "en",
    receivedAt: "2026-11-30T08:15:00.000Z",
  },
  {
    reference: "Q-2026-0005",
    school: "tamsin-creek",
    topic: "signs",
    room: null,
    body: "¿Dónde deben esperar los padres a la salida? Hay flechas nuevas en el suelo y no sé si puedo entrar al pasillo.",
    askerName: "Rafael Ontiveros",
    askerEmail: "r.ontiveros@example.net",
    language: "es",
    receivedAt: "2026-11-30T19:50:00.000Z",
  },
  {
    reference: "Q-2026-0006",
    school: "corrow-ridge",
    topic: "distancing",
    room: "Room 203",
    body: "How far apart are the desks now in the maths rooms? My daughter says they are still close together.",
    askerName: null,
    askerEmail: "marisol.quenby@example.net",
    language: "en",
    receivedAt: "2026-12-01T07:30:00.000Z",
  },
];

/** District settings a fresh install starts with; the admin edits them. */
export const SEED_SETTINGS: Record<string, unknown> = {
  reply_target_school_days: 3,
  district_name: DEMO_DISTRICT,
  district_holidays: [
    "2026-11-26",
    "2026-11-27",
    "2026-12-21",
    "2026-12-22",
    "2026-12-23",
    "2026-12-24",
    "2026-12-25",
    "2026-12-28",
    "2026-12-29",
    "2026-12-30",
    "2026-12-31",
    "2027-01-01",
    "2027-01-18",
    "2027-02-15",
    "2027-03-29",
    "2027-03-30",
    "2027-03-31",
    "2027-04-01",
    "2027-04-02",
    "2027-05-31",
  ],
};

export interface SeedProject {
  school: string;
  key: string;
  title: string;
  kind: "roof" | "windows" | "air_conditioning" | "ventilation" | "generator" | "entrance" | "other";
  summary: string;
  status: "planned" | "under_way" | "finished";
  statusDate: string;
}

export const SEED_PROJECTS: SeedProject[] = [
  { school: "tamsin-creek", key: "ventilators", title: "New unit ventilators with CO2 sensors", kind: "ventilation", summary: "Every classroom has a new unit ventilator that brings in outdoor air, with a sensor that shows the carbon dioxide level.", status: "finished", statusDate: "2026-08-14" },
  { school: "tamsin-creek", key: "roof", title: "Roof replaced", kind: "roof", summary: "The whole roof was replaced, with new insulation and drains.", status: "finished", statusDate: "2026-07-31" },
  { school: "tamsin-creek", key: "windows", title: "New windows that open", kind: "windows", summary: "Classroom windows were replaced with ones that open safely for fresh air.", status: "finished", statusDate: "2026-08-21" },
  { school: "tamsin-creek", key: "cooling", title: "Air conditioning in the library and gym", kind: "air_conditioning", summary: "The library and gym now have air conditioning for hot days.", status: "under_way", statusDate: "2026-12-18" },
  { school: "corrow-ridge", key: "ventilators", title: "New unit ventilators with CO2 sensors", kind: "ventilation", summary: "Classrooms have new unit ventilators that bring in outdoor air, with a carbon dioxide sensor in each room.", status: "finished", statusDate: "2026-08-07" },
  { school: "corrow-ridge", key: "filters", title: "MERV-13 filters in the central air handler", kind: "ventilation", summary: "The central air handler that serves the library, office and gym now uses MERV-13 filters.", status: "finished", statusDate: "2026-08-28" },
  { school: "corrow-ridge", key: "generator", title: "Emergency generator", kind: "generator", summary: "A new emergency generator keeps most of the building running in a power cut.", status: "finished", statusDate: "2026-10-09" },
  { school: "corrow-ridge", key: "stairs", title: "One-way stairs and hallway signs", kind: "other", summary: "New signs and floor markings make the east stairs up only and the west stairs down only.", status: "finished", statusDate: "2026-08-25" },
  { school: "eastmere", key: "cooling", title: "Air conditioning replaced throughout", kind: "air_conditioning", summary: "New rooftop air handlers heat, cool and filter the air in every part of the school.", status: "finished", statusDate: "2026-08-19" },
  { school: "eastmere", key: "lab-exhaust", title: "Exhaust for the science labs", kind: "ventilation", summary: "Each science lab has its own exhaust fans that send lab air straight outside.", status: "finished", statusDate: "2026-09-04" },
  { school: "eastmere", key: "generator", title: "Emergency generator", kind: "generator", summary: "An emergency generator covers most of the building if the power goes out.", status: "under_way", statusDate: "2026-12-11" },
  { school: "eastmere", key: "entrance", title: "New main entrance with a welcome desk", kind: "entrance", summary: "Visitors now come in through one main entrance with a staffed welcome desk.", status: "planned", statusDate: "2027-01-15" },
];
