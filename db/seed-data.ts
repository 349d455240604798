import type { Attachment, PayloadCategory, PayloadShape, Role, SetupStatus, Thread } from "../lib/domain";

// The invented demo scenario: a small workshop that sews three envelope models of its own naming,
// a few customers who fly antennas, cameras and sensors under them, and a support desk.
// Every name here is made up; e-mail addresses use the reserved .test domain.
// Payload offsets hang each item below the mount's carriage, which drops about 5 cm under the rail.

// Long enough and hard enough to guess for the password rule (lib/auth/password-strength.ts).
export const DEMO_PASSWORD = "dune-lantern-47";

export interface DemoUser {
  id: string;
  name: string;
  email: string;
  role: Role;
}

export const DEMO_USERS: readonly DemoUser[] = [
  { id: "usr-customer-1", name: "Wren Halloway", email: "customer@trimrail.test", role: "customer" },
  { id: "usr-customer-2", name: "Tobin Aske", email: "tobin@trimrail.test", role: "customer" },
  { id: "usr-customer-3", name: "Mirela Dunstan", email: "mirela@trimrail.test", role: "customer" },
  { id: "usr-customer-4", name: "Kasper Lindqvet", email: "kasper@trimrail.test", role: "customer" },
  { id: "usr-support-1", name: "Sunniva Rook", email: "support@trimrail.test", role: "support" },
  { id: "usr-support-2", name: "Orrin Pell", email: "orrin@trimrail.test", role: "support" },
  { id: "usr-maker-1", name: "Hedda Marlowe", email: "maker@trimrail.test", role: "maker" },
];

/** Which hull of lib/balance's demo set each model is sewn from, and its catalogue facts. */
export interface DemoModel {
  id: string;
  slug: string;
  hullKey: string;
  name: string;
  description: string;
  nominalMassKg: number;
  railTabCount: number;
}

export const DEMO_MODELS: readonly DemoModel[] = [
  {
    id: "mdl-ridge-06",
    slug: "ridge-06",
    hullKey: "ridge-06",
    name: "Ridge 0.6",
    description: "The small one: a light camera or logger on a calm day.",
    nominalMassKg: 0.26,
    railTabCount: 7,
  },
  {
    id: "mdl-ridge-11",
    slug: "ridge-11",
    hullKey: "ridge-11",
    name: "Ridge 1.1",
    description: "The everyday lifter for an antenna or a relay box; one 40 ft³ cylinder fills it.",
    nominalMassKg: 0.47,
    railTabCount: 9,
  },
  {
    id: "mdl-ridge-18",
    slug: "ridge-18",
    hullKey: "ridge-18",
    name: "Ridge 1.8",
    description: "For heavier sensor packages and windier sites.",
    nominalMassKg: 0.72,
    railTabCount: 11,
  },
];

export interface DemoUnit {
  id: string;
  modelId: string;
  serial: string;
  ownerId: string | null;
  measuredMassKg: number;
  measuredGrossLiftKg: number;
  measuredAtTemperatureC: number;
  measuredAtAltitudeM: number;
  measuredOn: string;
}

export const DEMO_UNITS: readonly DemoUnit[] = [
  {
    id: "unit-r06-0012",
    modelId: "mdl-ridge-06",
    serial: "R06-0012",
    ownerId: "usr-customer-1",
    measuredMassKg: 0.262,
    measuredGrossLiftKg: 0.61,
    measuredAtTemperatureC: 16,
    measuredAtAltitudeM: 40,
    measuredOn: "2026-09-14",
  },
  {
    id: "unit-r06-0019",
    modelId: "mdl-ridge-06",
    serial: "R06-0019",
    ownerId: "usr-customer-3",
    measuredMassKg: 0.258,
    measuredGrossLiftKg: 0.62,
    measuredAtTemperatureC: 15,
    measuredAtAltitudeM: 40,
    measuredOn: "2026-10-02",
  },
  {
    id: "unit-r11-0007",
    modelId: "mdl-ridge-11",
    serial: "R11-0007",
    ownerId: "usr-customer-1",
    measuredMassKg: 0.474,
    measuredGrossLiftKg: 1.13,
    measuredAtTemperatureC: 18,
    measuredAtAltitudeM: 40,
    measuredOn: "2026-08-21",
  },
  {
    id: "unit-r11-0023",
    modelId: "mdl-ridge-11",
    serial: "R11-0023",
    ownerId: "usr-customer-2",
    measuredMassKg: 0.468,
    measuredGrossLiftKg: 1.14,
    measuredAtTemperatureC: 14,
    measuredAtAltitudeM: 40,
    measuredOn: "2026-10-11",
  },
  {
    id: "unit-r11-0031",
    modelId: "mdl-ridge-11",
    serial: "R11-0031",
    ownerId: null,
    measuredMassKg: 0.471,
    measuredGrossLiftKg: 1.12,
    measuredAtTemperatureC: 17,
    measuredAtAltitudeM: 40,
    measuredOn: "2026-11-03",
  },
  {
    id: "unit-r18-0004",
    modelId: "mdl-ridge-18",
    serial: "R18-0004",
    ownerId: "usr-customer-4",
    measuredMassKg: 0.716,
    measuredGrossLiftKg: 1.86,
    measuredAtTemperatureC: 15,
    measuredAtAltitudeM: 40,
    measuredOn: "2026-07-30",
  },
];

export interface DemoLiftTest {
  id: string;
  unitId: string;
  measuredGrossLiftKg: number;
  temperatureC: number;
  pressurePa: number | null;
  altitudeM: number;
  purity: number;
  testedOn: string;
  notes: string;
}

/** Each unit's first weighing (as the migration moved it) and, for the workshop's spare, a re-test with a known mixed fill. */
export const DEMO_LIFT_TESTS: readonly DemoLiftTest[] = [
  ...DEMO_UNITS.map((u) => ({
    id: `lt-${u.id}-first`,
    unitId: u.id,
    measuredGrossLiftKg: u.measuredGrossLiftKg,
    temperatureC: u.measuredAtTemperatureC,
    pressurePa: null,
    altitudeM: u.measuredAtAltitudeM,
    purity: 1,
    testedOn: u.measuredOn,
    notes: "first weighing at the workshop",
  })),
  {
    id: "lt-unit-r11-0031-retest",
    unitId: "unit-r11-0031",
    measuredGrossLiftKg: 1.07,
    temperatureC: 12,
    pressurePa: 100_900,
    altitudeM: 40,
    purity: 0.96,
    testedOn: "2026-11-24",
    notes: "re-weighed after a seam repair; cylinder assayed at 96 %",
  },
];

export interface DemoMount {
  id: string;
  name: string;
  thread: Thread;
  massKg: number;
  ratedLoadKg: number;
  safetyLineBreakingLoadN: number;
}

export const DEMO_MOUNTS: readonly DemoMount[] = [
  {
    id: "mnt-slider-14",
    name: "Rail slider, 1/4-20 screw",
    thread: "1/4-20 UNC",
    massKg: 0.045,
    ratedLoadKg: 1.5,
    safetyLineBreakingLoadN: 450,
  },
  {
    id: "mnt-slider-38",
    name: "Rail slider, 3/8-16 screw",
    thread: "3/8-16 UNC",
    massKg: 0.07,
    ratedLoadKg: 3,
    safetyLineBreakingLoadN: 900,
  },
  {
    id: "mnt-slider-lite",
    name: "Light rail slider, 1/4-20 screw",
    thread: "1/4-20 UNC",
    massKg: 0.028,
    ratedLoadKg: 0.6,
    safetyLineBreakingLoadN: 250,
  },
];

export interface DemoAdapter {
  id: string;
  name: string;
  fromThread: Attachment;
  toThread: Thread;
  massKg: number;
  ratedLoadKg: number;
}

// `from` is the payload's side, `to` the mount's screw.
export const DEMO_ADAPTERS: readonly DemoAdapter[] = [
  {
    id: "adp-38-to-14",
    name: "3/8-16 socket to 1/4-20 screw bush",
    fromThread: "3/8-16 UNC",
    toThread: "1/4-20 UNC",
    massKg: 0.012,
    ratedLoadKg: 2,
  },
  {
    id: "adp-14-to-38",
    name: "1/4-20 socket to 3/8-16 screw bush",
    fromThread: "1/4-20 UNC",
    toThread: "3/8-16 UNC",
    massKg: 0.01,
    ratedLoadKg: 2,
  },
  { id: "adp-strap-14", name: "Strap clamp plate on 1/4-20", fromThread: "strap", toThread: "1/4-20 UNC", massKg: 0.03, ratedLoadKg: 1 },
];

export interface DemoTemplate {
  id: string;
  name: string;
  category: PayloadCategory;
  description: string;
  massKg: number;
  shape: PayloadShape;
  lengthM: number;
  widthM: number;
  heightM: number;
  attachment: Attachment;
  dragAreaM2: number;
  offsetXM: number;
  offsetZM: number;
}

export const DEMO_TEMPLATES: readonly DemoTemplate[] = [
  {
    id: "tpl-vhf-whip",
    name: "Quarter-wave VHF whip",
    category: "antenna",
    description: "2 m band whip on a small base, hanging tip down.",
    massKg: 0.085,
    shape: "rod",
    lengthM: 0.012,
    widthM: 0.012,
    heightM: 0.5,
    attachment: "1/4-20 UNC",
    dragAreaM2: 0.004,
    offsetXM: 0,
    offsetZM: -0.3,
  },
  {
    id: "tpl-uhf-groundplane",
    name: "UHF ground-plane antenna",
    category: "antenna",
    description: "70 cm vertical with four radials.",
    massKg: 0.14,
    shape: "rod",
    lengthM: 0.3,
    widthM: 0.3,
    heightM: 0.2,
    attachment: "3/8-16 UNC",
    dragAreaM2: 0.006,
    offsetXM: 0,
    offsetZM: -0.15,
  },
  {
    id: "tpl-action-cam",
    name: "Small action camera",
    category: "camera",
    description: "Fixed-lens camera in its frame, pointing down.",
    massKg: 0.125,
    shape: "box",
    lengthM: 0.065,
    widthM: 0.045,
    heightM: 0.05,
    attachment: "1/4-20 UNC",
    dragAreaM2: 0.0035,
    offsetXM: 0,
    offsetZM: -0.075,
  },
  {
    id: "tpl-survey-cam",
    name: "Survey camera on a pendulum",
    category: "camera",
    description: "Compact camera hanging on a self-levelling pendulum frame.",
    massKg: 0.42,
    shape: "box",
    lengthM: 0.14,
    widthM: 0.1,
    heightM: 0.16,
    attachment: "3/8-16 UNC",
    dragAreaM2: 0.014,
    offsetXM: 0,
    offsetZM: -0.13,
  },
  {
    id: "tpl-th-logger",
    name: "Temperature/humidity logger",
    category: "sensor",
    description: "Logger in a small ventilated shield.",
    massKg: 0.06,
    shape: "cylinder",
    lengthM: 0.05,
    widthM: 0.05,
    heightM: 0.09,
    attachment: "1/4-20 UNC",
    dragAreaM2: 0.0045,
    offsetXM: 0,
    offsetZM: -0.095,
  },
  {
    id: "tpl-aq-pod",
    name: "Air-quality sensor pod",
    category: "sensor",
    description: "Particle and gas sensors with a small fan and battery.",
    massKg: 0.23,
    shape: "box",
    lengthM: 0.12,
    widthM: 0.08,
    heightM: 0.07,
    attachment: "strap",
    dragAreaM2: 0.0084,
    offsetXM: 0,
    offsetZM: -0.085,
  },
  {
    id: "tpl-relay-box",
    name: "Low-power radio relay box",
    category: "radio",
    description: "Relay board, battery and a short stub antenna.",
    massKg: 0.19,
    shape: "box",
    lengthM: 0.1,
    widthM: 0.07,
    heightM: 0.04,
    attachment: "1/4-20 UNC",
    dragAreaM2: 0.004,
    offsetXM: 0,
    offsetZM: -0.07,
  },
  {
    id: "tpl-gps-tracker",
    name: "Position tracker",
    category: "radio",
    description: "Satellite position tracker that reports over a radio link.",
    massKg: 0.045,
    shape: "box",
    lengthM: 0.06,
    widthM: 0.04,
    heightM: 0.02,
    attachment: "strap",
    dragAreaM2: 0.0012,
    offsetXM: 0,
    offsetZM: -0.06,
  },
  {
    id: "tpl-strobe",
    name: "White strobe",
    category: "light",
    description: "Battery strobe, visible for several kilometres at night.",
    massKg: 0.055,
    shape: "cylinder",
    lengthM: 0.04,
    widthM: 0.04,
    heightM: 0.07,
    attachment: "1/4-20 UNC",
    dragAreaM2: 0.0028,
    offsetXM: 0,
    offsetZM: -0.085,
  },
  {
    id: "tpl-marker-light",
    name: "Red marker light",
    category: "light",
    description: "Steady red light for night flying.",
    massKg: 0.035,
    shape: "cylinder",
    lengthM: 0.035,
    widthM: 0.035,
    heightM: 0.05,
    attachment: "1/4-20 UNC",
    dragAreaM2: 0.0018,
    offsetXM: 0,
    offsetZM: -0.075,
  },
];

export interface DemoSetupPayload {
  templateId: string;
  adapterId?: string;
  /** Added to the template's offset, for a second item hung beside the first. */
  extraOffsetXM?: number;
}

export interface DemoSetup {
  id: string;
  ownerId: string;
  name: string;
  modelId: string;
  unitId: string | null;
  mountId: string;
  /** Where on the rail the mount sits, 0 = rail start, 1 = rail end. */
  railFraction: number;
  siteName: string;
  altitudeM: number;
  temperatureC: number | null;
  windMS: number;
  gustMS: number | null;
  purity: number;
  tetherLengthOutM: number;
  /** Where the wind was read; absent = a 10 m mast. */
  windMeasuredAtM?: number;
  /** 0–1; absent = dry air. */
  relativeHumidity?: number;
  /** The payload height the customer wants, for the operating envelope. */
  targetHeightM?: number;
  status: SetupStatus;
  payloads: DemoSetupPayload[];
  daysAgo: number;
}

const tether = { tetherMassPerMetreKg: 0.0012, tetherBreakingLoadN: 900, tetherDiameterM: 0.0015 } as const;
export const DEMO_TETHER = tether;

export const DEMO_SETUPS: readonly DemoSetup[] = [
  // Wren Halloway, the demo customer: one in every state.
  {
    id: "set-wren-whip",
    ownerId: "usr-customer-1",
    name: "Field day VHF whip",
    modelId: "mdl-ridge-11",
    unitId: "unit-r11-0007",
    mountId: "mnt-slider-14",
    railFraction: 0.5,
    siteName: "Harrow Down club field",
    altitudeM: 120,
    temperatureC: 14,
    windMS: 4,
    gustMS: 7,
    purity: 0.98,
    tetherLengthOutM: 60,
    windMeasuredAtM: 2,
    targetHeightM: 40,
    status: "draft",
    payloads: [{ templateId: "tpl-vhf-whip" }, { templateId: "tpl-th-logger", extraOffsetXM: 0.06 }],
    daysAgo: 1,
  },
  {
    id: "set-wren-cam",
    ownerId: "usr-customer-1",
    name: "Orchard survey camera",
    modelId: "mdl-ridge-11",
    unitId: "unit-r11-0007",
    mountId: "mnt-slider-14",
    railFraction: 0.45,
    siteName: "Quillby orchard",
    altitudeM: 60,
    temperatureC: 18,
    windMS: 3,
    gustMS: 6,
    purity: 0.99,
    tetherLengthOutM: 40,
    status: "submitted",
    payloads: [{ templateId: "tpl-action-cam" }],
    daysAgo: 3,
  },
  {
    id: "set-wren-logger",
    ownerId: "usr-customer-1",
    name: "Hill logger, small envelope",
    modelId: "mdl-ridge-06",
    unitId: "unit-r06-0012",
    mountId: "mnt-slider-lite",
    railFraction: 0.5,
    siteName: "Cold Fell summit",
    altitudeM: 610,
    temperatureC: 6,
    windMS: 5,
    gustMS: 9,
    purity: 0.97,
    tetherLengthOutM: 30,
    status: "changes_requested",
    payloads: [{ templateId: "tpl-th-logger" }],
    daysAgo: 6,
  },
  {
    id: "set-wren-strobe",
    ownerId: "usr-customer-1",
    name: "Night marker strobe",
    modelId: "mdl-ridge-06",
    unitId: "unit-r06-0012",
    mountId: "mnt-slider-lite",
    railFraction: 0.55,
    siteName: "Harrow Down club field",
    altitudeM: 120,
    temperatureC: 9,
    windMS: 2,
    gustMS: 4,
    purity: 0.98,
    tetherLengthOutM: 25,
    status: "approved",
    payloads: [{ templateId: "tpl-strobe" }],
    daysAgo: 12,
  },
  {
    id: "set-wren-heavy",
    ownerId: "usr-customer-1",
    name: "Survey camera, too heavy?",
    modelId: "mdl-ridge-06",
    unitId: "unit-r06-0012",
    mountId: "mnt-slider-lite",
    railFraction: 0.5,
    siteName: "Quillby orchard",
    altitudeM: 60,
    temperatureC: 18,
    windMS: 3,
    gustMS: 5,
    purity: 0.98,
    tetherLengthOutM: 30,
    status: "draft",
    payloads: [{ templateId: "tpl-survey-cam", adapterId: "adp-38-to-14" }],
    daysAgo: 2,
  },
  // Tobin Aske: radio work.
  {
    id: "set-tobin-relay",
    ownerId: "usr-customer-2",
    name: "Valley relay",
    modelId: "mdl-ridge-11",
    unitId: "unit-r11-0023",
    mountId: "mnt-slider-14",
    railFraction: 0.5,
    siteName: "Brackwater valley",
    altitudeM: 210,
    temperatureC: 12,
    windMS: 4,
    gustMS: 8,
    purity: 0.98,
    tetherLengthOutM: 80,
    status: "submitted",
    payloads: [{ templateId: "tpl-relay-box" }, { templateId: "tpl-gps-tracker", adapterId: "adp-strap-14", extraOffsetXM: -0.05 }],
    daysAgo: 2,
  },
  {
    id: "set-tobin-uhf",
    ownerId: "usr-customer-2",
    name: "UHF ground plane test",
    modelId: "mdl-ridge-11",
    unitId: "unit-r11-0023",
    mountId: "mnt-slider-38",
    railFraction: 0.5,
    siteName: "Brackwater valley",
    altitudeM: 210,
    temperatureC: 12,
    windMS: 3,
    gustMS: 6,
    purity: 0.98,
    tetherLengthOutM: 60,
    status: "approved",
    payloads: [{ templateId: "tpl-uhf-groundplane" }],
    daysAgo: 20,
  },
  {
    id: "set-tobin-whip2",
    ownerId: "usr-customer-2",
    name: "Whip and marker light",
    modelId: "mdl-ridge-11",
    unitId: "unit-r11-0023",
    mountId: "mnt-slider-14",
    railFraction: 0.55,
    siteName: "Brackwater valley",
    altitudeM: 210,
    temperatureC: 8,
    windMS: 5,
    gustMS: 9,
    purity: 0.97,
    tetherLengthOutM: 70,
    status: "changes_requested",
    payloads: [{ templateId: "tpl-vhf-whip" }, { templateId: "tpl-marker-light", extraOffsetXM: 0.05 }],
    daysAgo: 8,
  },
  {
    id: "set-tobin-draft",
    ownerId: "usr-customer-2",
    name: "Relay, windy day plan",
    modelId: "mdl-ridge-11",
    unitId: null,
    mountId: "mnt-slider-14",
    railFraction: 0.4,
    siteName: "Brackwater ridge",
    altitudeM: 380,
    temperatureC: 7,
    windMS: 7,
    gustMS: 11,
    purity: 0.98,
    tetherLengthOutM: 90,
    status: "draft",
    payloads: [{ templateId: "tpl-relay-box" }],
    daysAgo: 1,
  },
  {
    id: "set-tobin-approved2",
    ownerId: "usr-customer-2",
    name: "Tracker only",
    modelId: "mdl-ridge-06",
    unitId: null,
    mountId: "mnt-slider-lite",
    railFraction: 0.5,
    siteName: "Brackwater valley",
    altitudeM: 210,
    temperatureC: 12,
    windMS: 3,
    gustMS: 5,
    purity: 0.99,
    tetherLengthOutM: 40,
    status: "approved",
    payloads: [{ templateId: "tpl-gps-tracker", adapterId: "adp-strap-14" }],
    daysAgo: 30,
  },
  // Mirela Dunstan: air-quality work.
  {
    id: "set-mirela-aq",
    ownerId: "usr-customer-3",
    name: "Street-canyon air sampling",
    modelId: "mdl-ridge-11",
    unitId: null,
    mountId: "mnt-slider-14",
    railFraction: 0.5,
    siteName: "Fenmarsh allotments",
    altitudeM: 15,
    temperatureC: 11,
    windMS: 3,
    gustMS: 5,
    purity: 0.98,
    tetherLengthOutM: 35,
    relativeHumidity: 0.85,
    status: "submitted",
    payloads: [{ templateId: "tpl-aq-pod", adapterId: "adp-strap-14" }],
    daysAgo: 1,
  },
  {
    id: "set-mirela-th",
    ownerId: "usr-customer-3",
    name: "Profile logger",
    modelId: "mdl-ridge-06",
    unitId: "unit-r06-0019",
    mountId: "mnt-slider-lite",
    railFraction: 0.5,
    siteName: "Fenmarsh allotments",
    altitudeM: 15,
    temperatureC: 13,
    windMS: 2,
    gustMS: 4,
    purity: 0.99,
    tetherLengthOutM: 50,
    status: "approved",
    payloads: [{ templateId: "tpl-th-logger" }],
    daysAgo: 25,
  },
  {
    id: "set-mirela-both",
    ownerId: "usr-customer-3",
    name: "Logger and tracker",
    modelId: "mdl-ridge-06",
    unitId: "unit-r06-0019",
    mountId: "mnt-slider-lite",
    railFraction: 0.6,
    siteName: "Fenmarsh allotments",
    altitudeM: 15,
    temperatureC: 13,
    windMS: 4,
    gustMS: 7,
    purity: 0.98,
    tetherLengthOutM: 50,
    status: "changes_requested",
    payloads: [{ templateId: "tpl-th-logger" }, { templateId: "tpl-gps-tracker", adapterId: "adp-strap-14", extraOffsetXM: 0.05 }],
    daysAgo: 5,
  },
  {
    id: "set-mirela-draft",
    ownerId: "usr-customer-3",
    name: "Air pod on the small envelope",
    modelId: "mdl-ridge-06",
    unitId: "unit-r06-0019",
    mountId: "mnt-slider-lite",
    railFraction: 0.5,
    siteName: "Fenmarsh allotments",
    altitudeM: 15,
    temperatureC: 11,
    windMS: 3,
    gustMS: 5,
    purity: 0.98,
    tetherLengthOutM: 35,
    status: "draft",
    payloads: [{ templateId: "tpl-aq-pod" }],
    daysAgo: 0,
  },
  // Kasper Lindqvet: heavier survey work on the big envelope.
  {
    id: "set-kasper-survey",
    ownerId: "usr-customer-4",
    name: "Dune survey camera",
    modelId: "mdl-ridge-18",
    unitId: "unit-r18-0004",
    mountId: "mnt-slider-38",
    railFraction: 0.5,
    siteName: "Saltgrave dunes",
    altitudeM: 10,
    temperatureC: 16,
    windMS: 5,
    gustMS: 9,
    purity: 0.98,
    tetherLengthOutM: 100,
    status: "submitted",
    payloads: [{ templateId: "tpl-survey-cam" }],
    daysAgo: 4,
  },
  {
    id: "set-kasper-combo",
    ownerId: "usr-customer-4",
    name: "Camera plus air pod",
    modelId: "mdl-ridge-18",
    unitId: "unit-r18-0004",
    mountId: "mnt-slider-38",
    railFraction: 0.45,
    siteName: "Saltgrave dunes",
    altitudeM: 10,
    temperatureC: 16,
    windMS: 4,
    gustMS: 8,
    purity: 0.98,
    tetherLengthOutM: 80,
    status: "changes_requested",
    payloads: [{ templateId: "tpl-survey-cam" }, { templateId: "tpl-aq-pod", adapterId: "adp-strap-14", extraOffsetXM: 0.12 }],
    daysAgo: 9,
  },
  {
    id: "set-kasper-night",
    ownerId: "usr-customer-4",
    name: "Night strobe and light",
    modelId: "mdl-ridge-18",
    unitId: "unit-r18-0004",
    mountId: "mnt-slider-38",
    railFraction: 0.5,
    siteName: "Saltgrave dunes",
    altitudeM: 10,
    temperatureC: 9,
    windMS: 3,
    gustMS: 6,
    purity: 0.98,
    tetherLengthOutM: 60,
    status: "approved",
    payloads: [
      { templateId: "tpl-strobe", adapterId: "adp-14-to-38" },
      { templateId: "tpl-marker-light", adapterId: "adp-14-to-38", extraOffsetXM: 0.06 },
    ],
    daysAgo: 40,
  },
  {
    id: "set-kasper-uplands",
    ownerId: "usr-customer-4",
    name: "Upland survey, high site",
    modelId: "mdl-ridge-18",
    unitId: null,
    mountId: "mnt-slider-38",
    railFraction: 0.5,
    siteName: "Greyscar moor",
    altitudeM: 1450,
    temperatureC: 4,
    windMS: 6,
    gustMS: 10,
    purity: 0.96,
    tetherLengthOutM: 60,
    status: "draft",
    payloads: [{ templateId: "tpl-survey-cam" }, { templateId: "tpl-relay-box", adapterId: "adp-14-to-38", extraOffsetXM: -0.1 }],
    daysAgo: 2,
  },
  {
    id: "set-kasper-whip",
    ownerId: "usr-customer-4",
    name: "Whip on the big envelope",
    modelId: "mdl-ridge-18",
    unitId: null,
    mountId: "mnt-slider-14",
    railFraction: 0.5,
    siteName: "Saltgrave dunes",
    altitudeM: 10,
    temperatureC: 16,
    windMS: 4,
    gustMS: 7,
    purity: 0.98,
    tetherLengthOutM: 100,
    status: "submitted",
    payloads: [{ templateId: "tpl-vhf-whip" }],
    daysAgo: 1,
  },
  {
    id: "set-kasper-old",
    ownerId: "usr-customer-4",
    name: "First test, logger",
    modelId: "mdl-ridge-18",
    unitId: "unit-r18-0004",
    mountId: "mnt-slider-14",
    railFraction: 0.5,
    siteName: "Saltgrave dunes",
    altitudeM: 10,
    temperatureC: 14,
    windMS: 2,
    gustMS: 4,
    purity: 0.99,
    tetherLengthOutM: 50,
    status: "approved",
    payloads: [{ templateId: "tpl-th-logger" }],
    daysAgo: 60,
  },
];

export interface DemoReview {
  setupId: string;
  reviewerId: string;
  reasons: string[];
  note: string;
  comment: string;
}

// What support said on the setups that were decided; reasons use the engine's flag codes.
export const DEMO_REVIEWS: readonly DemoReview[] = [
  {
    setupId: "set-wren-logger",
    reviewerId: "usr-support-1",
    reasons: ["free-lift"],
    note: "Free lift is thin at that altitude.",
    comment: "At 610 m the small envelope has little to spare. Try the 1.1 or top up to full purity.",
  },
  {
    setupId: "set-tobin-whip2",
    reviewerId: "usr-support-2",
    reasons: ["tether-angle-gust"],
    note: "Gusts lay it over.",
    comment: "In 9 m/s gusts the tether lies flat; plan this for a calmer day or shorten the line.",
  },
  {
    setupId: "set-mirela-both",
    reviewerId: "usr-support-1",
    reasons: ["trim-calm"],
    note: "Mount too far aft.",
    comment: "Slide the mount forward until calm trim is near level, then resubmit.",
  },
  {
    setupId: "set-kasper-combo",
    reviewerId: "usr-support-2",
    reasons: ["mount-rated-load"],
    note: "Close to the slider's rating.",
    comment: "Two heavy items on one slider: move the air pod to its own strap plate.",
  },
  {
    setupId: "set-wren-strobe",
    reviewerId: "usr-support-1",
    reasons: [],
    note: "Good to fly.",
    comment: "Balanced and well within limits. Keep the safety line on.",
  },
  {
    setupId: "set-tobin-uhf",
    reviewerId: "usr-support-2",
    reasons: [],
    note: "Good to fly.",
    comment: "Looks fine; watch the radials near the tether.",
  },
  { setupId: "set-tobin-approved2", reviewerId: "usr-support-1", reasons: [], note: "Good to fly.", comment: "Light and level." },
  { setupId: "set-mirela-th", reviewerId: "usr-support-2", reasons: [], note: "Good to fly.", comment: "Approved." },
  {
    setupId: "set-kasper-night",
    reviewerId: "usr-support-1",
    reasons: [],
    note: "Good to fly.",
    comment: "Lights are fine; mind the local rules for night flying.",
  },
  { setupId: "set-kasper-old", reviewerId: "usr-support-2", reasons: [], note: "Good to fly.", comment: "Approved." },
];
