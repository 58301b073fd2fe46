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
  // Air and seating choices (lib/settings/air.ts); none is a limit from a standard.
  co2_threshold_ppm: 1000,
  co2_outdoor_ppm: 420,
  co2_occupied_start_minute: 480,
  co2_occupied_end_minute: 900,
  seating_spacing_ft: 6,
  zone_air_distribution_effectiveness: 1,
  // The district's own clock: which day a question arrived on, and so when its reply is due.
  district_time_zone: "America/New_York",
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

export interface SeedPublishedAnswer {
  /** null: for every school. */
  school: string | null;
  topic: string;
  /** The public wording of the question; also the seed's natural key. */
  question: string;
  answer: string;
  publishedAt: string;
}

/**
 * Answers the desk has already published, written the way the district writes its pages
 * and consistent with content/. Plain Markdown, no personal details.
 */
export const SEED_PUBLISHED_ANSWERS: SeedPublishedAnswer[] = [
  {
    school: "tamsin-creek",
    topic: "air",
    question: "Does my child's classroom at Tamsin Creek get fresh air from outside, or does the same air just go round?",
    answer: `Every classroom at Tamsin Creek gets fresh air from outside, even when the windows are closed.

Each room has a new **unit ventilator**, the long cabinet under the windows. It pulls **outdoor air** in through a vent in the wall, passes it through a MERV-13 filter, warms it when needed, and blows it gently into the room. It also filters some of the room's own air and mixes it back in.

Each classroom also has a CO2 sensor. When the reading passes 800 ppm, the unit opens its outdoor air damper wider, and our facilities staff get an alert if the reading stays high. On mild days teachers may open the new windows a few inches for extra air. On smoky days the windows stay shut and the filtered air does the work.

You can see the figures for each room on [the Tamsin Creek air page](/schools/tamsin-creek/air). If your child has asthma or another breathing condition, please talk with your doctor and the school nurse.`,
    publishedAt: "2026-11-19T15:00:00.000Z",
  },
  {
    school: "tamsin-creek",
    topic: "air",
    question: "Do the classrooms at Tamsin Creek have air conditioning?",
    answer: `No. The classrooms at Tamsin Creek do not have air conditioning. We are adding air conditioning to the **library** and the **gym**, the two largest rooms in the school. You can see where that work stands on [the Tamsin Creek building page](/schools/tamsin-creek/building).

On very hot days, teachers may bring classes to the library or gym for part of the day. Classrooms keep getting outdoor air from their unit ventilators, and teachers can open the windows a few inches.

Please send your child with a full water bottle on hot days.`,
    publishedAt: "2026-11-20T14:30:00.000Z",
  },
  {
    school: null,
    topic: "air",
    question: "What does the CO2 sensor in the classroom measure, and what level is too high?",
    answer: `CO2, or carbon dioxide, is a gas we all breathe out. When many people share a room and not enough outdoor air comes in, the level goes up. So the sensor tells us how well a room is being aired out. It does not detect germs.

CO2 is measured in parts per million (ppm). The CDC says a reading above 800 ppm suggests that a room may need more outdoor air. No standard sets a safe limit for CO2 indoors, so **800 ppm is a level our district chose to act on, not a danger line.**

When a room passes 800 ppm, the ventilation lets in more outdoor air. If the reading stays high, our facilities staff get an alert and check the room.

For questions about your own child's health, please ask the school nurse or your doctor.`,
    publishedAt: "2026-11-18T16:00:00.000Z",
  },
  {
    school: "eastmere",
    topic: "air",
    question: "How does Eastmere get fresh air into classrooms where the windows do not open?",
    answer: `Eastmere does not rely on windows for fresh air. New **air handlers on the roof** bring in outdoor air for many rooms at once. Each one mixes outdoor air with filtered room air, passes it through MERV-13 filters, heats or cools it, and sends it through ducts to the rooms. Air leaves each room through a return vent in the ceiling.

The classrooms have CO2 sensors. When a room passes 800 ppm, the system sends it more outdoor air, and facilities staff get an alert if the level stays high. Some rooms, such as the nurse's office and the music rooms, also have a portable air cleaner with a HEPA filter.

On smoky days the system can cut back on outdoor air for a while, with the filters still running. Read more on [the Eastmere air page](/schools/eastmere/air).`,
    publishedAt: "2026-11-21T13:00:00.000Z",
  },
  {
    school: "eastmere",
    topic: "building",
    question: "What will the emergency generator at Eastmere keep running if the power goes out?",
    answer: `The emergency generator at Eastmere stands in a locked, fenced yard beside the loading dock. You can see where its work stands on [the Eastmere building page](/schools/eastmere/building). When it is running, it starts on its own within moments of a power cut and covers most of the building:

- heat
- lights in every room, hall and stairway
- the fire alarm
- refrigeration in the kitchen, so food stays safe
- the ventilation fans in the air handlers, and the lab exhaust
- the elevators, phones, computer network and door locks

It does not run the cooling machines of the air conditioning, the kitchen ovens, the stage lights or the field lights. None of these are needed to keep people safe. The fans keep moving filtered outdoor air even though the air is not cooled, and teachers stop any lab work with chemicals until the power is back.

The generator runs for a short test each week, so you may hear it. Please keep students away from the generator yard.`,
    publishedAt: "2026-11-24T15:30:00.000Z",
  },
  {
    school: "corrow-ridge",
    topic: "building",
    question: "Does the generator at Corrow Ridge keep the heat and the ventilation on in a power cut?",
    answer: `Yes. The new emergency generator behind Corrow Ridge starts on its own within moments of a power cut. It keeps the **heat**, the lights, the fire alarm, the kitchen refrigeration, the phones and network, the elevator and the **ventilation** running: both the classroom unit ventilators and the fans of the central air handler.

A few things that use a lot of power are not on the generator: the cooling for the library and main office, the kitchen ovens and dishwasher, the machines in the tech shop, and the field lights. During a long outage the kitchen would serve cold lunches and shop classes would not use machines. The building stays warm, lit and aired out.

Only licensed electricians service the generator. It runs for a short test each week.`,
    publishedAt: "2026-11-22T14:00:00.000Z",
  },
  {
    school: "tamsin-creek",
    topic: "building",
    question: "What happens at Tamsin Creek if the power goes out? Is there a generator?",
    answer: `Tamsin Creek does not have a full emergency generator. That work was planned for our larger schools first.

Like every school, Tamsin Creek has emergency lights and a fire alarm that run on batteries when the power goes out, as the fire code requires. Every room is on the ground floor, and in a short outage classes carry on in daylight.

If the power stays out, the district may send children home early. We will tell you by phone and e-mail. After any outage, kitchen staff check the fridges and freezers and throw away any food that may not be safe.`,
    publishedAt: "2026-11-23T16:00:00.000Z",
  },
  {
    school: null,
    topic: "cleaning",
    question: "What products do custodians use to disinfect classrooms, and are they safe for a child with asthma?",
    answer: `Our custodians always clean first with soap or detergent and water, then disinfect. We use three classes of product, each exactly as its label says:

- a **quaternary ammonium disinfectant** ("quat") for most daily disinfecting. It has little smell, and a wall station mixes it with water at the label's strength;
- a **hydrogen peroxide disinfectant** in the nurse's office, some special rooms, and any room where a student or staff member has told us that quat products bother their skin or breathing;
- **diluted household bleach**, mixed fresh, only for deep cleaning after a reported case, and only in empty rooms.

Only trained staff use these products, and students never handle them. Bleach is never mixed with ammonia or any other cleaner.

If cleaning products trigger your child's asthma or allergies, please tell the school nurse. We will work out a plan with you, such as using the hydrogen peroxide product in your child's rooms. For advice about your child's health, follow your doctor and the local health department. Read more on [our cleaning and disinfection page](/district/cleaning-and-disinfection).`,
    publishedAt: "2026-11-20T16:30:00.000Z",
  },
  {
    school: null,
    topic: "cleaning",
    question: "Why are desks and railings sometimes still wet after they are cleaned?",
    answer: `That is on purpose. Every disinfectant has a **contact time** printed on its label: how long the surface must stay wet for the product to kill the germs the label lists. If the surface dries too soon, or someone wipes it off, the product may not finish its job.

So our staff put on enough product to keep the surface wet, and then leave it alone. Some products need about a minute, others a few minutes. Please do not wipe a damp desk or railing dry, and remind your child not to.`,
    publishedAt: "2026-11-19T17:00:00.000Z",
  },
  {
    school: null,
    topic: "cleaning",
    question: "Do you spray disinfectant in classrooms while students are there?",
    answer: `No. Some evenings our crews use an **electrostatic sprayer**, a hand-held machine that sprays disinfectant as a fine mist that clings to surfaces. We use it only in empty rooms, in the evening or on weekends, never with students or staff in the room.

The crew still cleans first, leaves the surfaces wet for the full contact time on the label, and airs the room out before it opens again. During the school day, day porters wipe touch points such as door handles and railings by hand.`,
    publishedAt: "2026-11-21T15:00:00.000Z",
  },
  {
    school: null,
    topic: "signs",
    question: "What do the orange \"wait here\" spots mean at pick-up?",
    answer: `The orange **wait here** spots on the sidewalk near each exit door show where families can stand at pick-up. They are set apart to give people room. Please stand on a spot while you wait. If all the spots are taken, wait a little farther back along the sidewalk or in your car.

Please arrive close to dismissal time, stay out of the bus lane, and tell the front office in writing if someone new will pick up your child. See [our signs and routes page](/district/signs-and-routes) for every sign.`,
    publishedAt: "2026-11-18T14:00:00.000Z",
  },
  {
    school: "corrow-ridge",
    topic: "signs",
    question: "Which stairs should my child use at Corrow Ridge?",
    answer: `Corrow Ridge has two main stairways, and both are now one-way:

- the **east stairs**, by the gym, are **up only**;
- the **west stairs**, by the music rooms, are **down only**.

Signs and floor markings show the way. Any student who needs it can use the elevator by the main office. Please ask the front office if your child needs more time between classes.

In a fire drill or any emergency, students use the nearest safe stairs, whatever the sign says, and follow staff directions.`,
    publishedAt: "2026-11-19T14:30:00.000Z",
  },
  {
    school: null,
    topic: "distancing",
    question: "How far apart are the desks in classrooms now?",
    answer: `We follow CDC guidance for schools. Desks are at least **3 feet apart** when students wear masks, and **6 feet apart** when they do not. Adults keep 6 feet from students and from each other where they can.

Lunch runs in smaller groups with assigned seats and space between them, and some classes eat in the gym, the library or their own classroom.

When health guidance changes, the local health department tells us, and we will write to families before the layout changes.`,
    publishedAt: "2026-11-23T15:00:00.000Z",
  },
  {
    school: null,
    topic: "cases",
    question: "If someone in my child's class is sick, how will I find out?",
    answer: `When a school learns that someone who was in the building has a contagious illness the health department tracks, we tell families **by letter and by e-mail within one school day**.

If your child was in the same class or group, you get a letter written for that group, with the days and places that matter and what to watch for. Other families may get a shorter note for the whole school.

We **never name** a child or a staff member, and we ask families not to guess. The **local health department** decides who needs to quarantine and for how long; the school nurse can help explain what they ask. Please keep your e-mail address and phone number up to date with the front office. Read each step on [our page about reported cases](/district/when-a-case-is-reported).`,
    publishedAt: "2026-11-20T15:30:00.000Z",
  },
  {
    school: null,
    topic: "other",
    question: "Can my child still drink from the water fountains?",
    answer: `Our water fountains now only fill bottles; they no longer have a spout to drink from. Please send your child with a **labelled, refillable water bottle**, full, every day. Custodians wipe the bottle fillers during the day with the other touch points.`,
    publishedAt: "2026-11-18T15:30:00.000Z",
  },
  {
    school: "eastmere",
    topic: "building",
    question: "Where do visitors check in at Eastmere?",
    answer: `Visitors use the **main entrance** and check in at the **welcome desk** just inside, where a staff member is on duty all school day. Please bring a photo ID; you will get a visitor badge to wear.

Students who arrive after the first bell also sign in at the welcome desk. After the first bell, all doors except the main entrance are locked. You can follow the entrance work on [the Eastmere building page](/schools/eastmere/building).`,
    publishedAt: "2026-11-25T14:00:00.000Z",
  },
  {
    school: "corrow-ridge",
    topic: "air",
    question: "What was done to the ventilation at Corrow Ridge, and how do you know it works?",
    answer: `Over the past year every classroom at Corrow Ridge got a new **unit ventilator**, the cabinet under the windows that brings in outdoor air, filters it and heats it. The gym, cafeteria, library and main office get their air from the **central air handler** above the gym, whose filters we raised to **MERV-13**.

After the work, licensed technicians measured the outdoor air each unit delivers and adjusted it. Our facilities staff compare those figures with what the ventilation standard asks for each room and its number of students. Each classroom also has a CO2 sensor; when a reading passes 800 ppm, the unit lets in more outdoor air, and staff get an alert if it stays high.

Rooms whose units cannot take MERV-13 filters have a portable air cleaner with a HEPA filter. You can see each room's figures on [the Corrow Ridge air page](/schools/corrow-ridge/air). If your child has asthma or another breathing condition, please talk with your doctor and the school nurse.`,
    publishedAt: "2026-11-17T15:00:00.000Z",
  },
  {
    school: null,
    topic: "distancing",
    question: "Does my child have to wear a face covering at school?",
    answer: `Not at the moment. Face coverings are welcome at every school, and no one is asked to take one off. We follow the **local health department**: if it asks schools to use face coverings again, for everyone or for one class after a reported case, we will tell you by letter and e-mail before the change starts.

A child who starts to feel sick at school waits in the nurse's office, and the nurse may offer a face covering while they wait to go home. The front office keeps spare ones for anyone who asks.

If you have a question about your own child's health and face coverings, please ask your doctor or the school nurse.`,
    publishedAt: "2026-11-26T15:00:00.000Z",
  },
  {
    school: null,
    topic: "cleaning",
    question: "Is there hand sanitizer in the classrooms, and is it safe for young children?",
    answer: `Yes. Every classroom, the cafeteria and each entrance has a wall dispenser of **alcohol-based hand sanitizer with at least 60% alcohol**, the kind the CDC recommends when soap and water are not at hand. Washing with soap and water is still best, and students wash their hands before lunch, after the restroom and whenever their hands look dirty.

In the elementary grades, children use hand sanitizer with an adult nearby, and the refill bottles are kept where children cannot reach them. Rub it in until the hands are dry.

If your child's skin reacts to it, tell the school nurse and your child can wash with soap and water instead. Hand sanitizer is for hands only: custodians clean surfaces with a separate product, as [our cleaning and disinfection page](/district/cleaning-and-disinfection) explains.`,
    publishedAt: "2026-11-16T16:00:00.000Z",
  },
];
