// The demo's installed base: an invented integrator, its service plans, four invented client
// organisations with their sites, the cabinet catalogue and twelve walls. Every name, address,
// brand and person here is made up; phone numbers use the 555-01xx range set aside for fiction,
// and e-mail domains end in .test (reserved by RFC 2606).
import type { Mounting, TicketPriority } from '../../../shared/schemas/enums.js';
import type { CabinetModel } from '../../../shared/schemas/cabinet-models.js';
import type { PlanTargets } from '../schema/clients.js';

export const company = {
  name: 'Lanternfield Display Services',
  officeEmail: 'office@gridkeep.test',
  phone: '+1 214 555 0100',
  address: '4120 Calloway Industrial Pkwy, Suite B, Brantley Springs, TX 75089',
  defaultTimeZone: 'America/Chicago',
};

type Targets = Record<TicketPriority, [response: number, resolution: number]>;
const targets = (t: Targets): PlanTargets => ({
  critical: { responseHours: t.critical[0], resolutionHours: t.critical[1] },
  high: { responseHours: t.high[0], resolutionHours: t.high[1] },
  normal: { responseHours: t.normal[0], resolutionHours: t.normal[1] },
  low: { responseHours: t.low[0], resolutionHours: t.low[1] },
});

export type PlanKey = 'essential' | 'extended' | 'allHours';

export const plans: Record<
  PlanKey,
  {
    name: string;
    clockMode: 'business' | 'round_the_clock';
    businessDays: number[];
    dayStart: string;
    dayEnd: string;
    targets: PlanTargets;
  }
> = {
  essential: {
    name: 'Essential',
    clockMode: 'business',
    businessDays: [1, 2, 3, 4, 5],
    dayStart: '08:00',
    dayEnd: '18:00',
    targets: targets({ critical: [4, 24], high: [8, 40], normal: [16, 80], low: [40, 160] }),
  },
  extended: {
    name: 'Extended',
    clockMode: 'business',
    businessDays: [1, 2, 3, 4, 5, 6],
    dayStart: '07:00',
    dayEnd: '21:00',
    targets: targets({ critical: [2, 12], high: [4, 24], normal: [8, 48], low: [24, 120] }),
  },
  allHours: {
    name: 'Round the clock',
    clockMode: 'round_the_clock',
    businessDays: [1, 2, 3, 4, 5, 6, 7],
    dayStart: '00:00',
    dayEnd: '23:59',
    targets: targets({ critical: [1, 8], high: [4, 24], normal: [8, 48], low: [24, 96] }),
  },
};

export type ClientKey = 'fellowship' | 'district' | 'venue' | 'freight';

interface ContactSpec {
  name: string;
  title: string;
  email: string;
  phone: string;
  receivesUpdates?: boolean;
}

export const clientSpecs: Record<
  ClientKey,
  {
    name: string;
    plan: PlanKey;
    domain: string;
    notes: string;
    contacts: ContactSpec[];
  }
> = {
  fellowship: {
    name: 'Cedar Hollow Fellowship',
    plan: 'extended',
    domain: 'cedarhollow.test',
    notes:
      'Three campuses. Weekend services are the priority: no work in the worship rooms on Sundays 08:30–13:00. ' +
      'Production director approves anything that takes a wall down for more than an hour. Invoices to the operations office.',
    contacts: [
      { name: 'Tobias Wrenfield', title: 'Production director', email: 'tobias.wrenfield@cedarhollow.test', phone: '+1 214 555 0131' },
      {
        name: 'Ruth Abernathy-Sole',
        title: 'Operations director',
        email: 'operations@cedarhollow.test',
        phone: '+1 214 555 0132',
        receivesUpdates: false,
      },
    ],
  },
  district: {
    name: 'Harrowgate Unified School District',
    plan: 'essential',
    domain: 'harrowgate-usd.test',
    notes:
      'Purchase orders required before any chargeable work (send quotes to the district technology office). ' +
      'Background-checked technicians only during school hours; sign in at each front office.',
    contacts: [
      { name: 'Lorna Pickett', title: 'Technology coordinator', email: 'lorna.pickett@harrowgate-usd.test', phone: '+1 614 555 0141' },
      { name: 'Abel Marchetti-Young', title: 'Facilities supervisor', email: 'facilities@harrowgate-usd.test', phone: '+1 614 555 0142' },
    ],
  },
  venue: {
    name: 'Copperline Events Center',
    plan: 'allHours',
    domain: 'copperline-events.test',
    notes:
      'Show days come first: check the event calendar before booking any visit. Night work after load-out is normal here. ' +
      'The outdoor plaza sign is under a city signage permit with brightness limits after sunset.',
    contacts: [
      { name: 'Desmond Achterberg', title: 'Head of video', email: 'desmond.achterberg@copperline-events.test', phone: '+1 480 555 0151' },
      { name: 'Imani Castellanos', title: 'Event operations manager', email: 'event.ops@copperline-events.test', phone: '+1 480 555 0152' },
    ],
  },
  freight: {
    name: 'Alderbrook Freight & Logistics',
    plan: 'essential',
    domain: 'alderbrook-freight.test',
    notes:
      'Corporate lobby wall, seen by every visitor: fix within the day when possible. Security badge issued at reception; ' +
      'ladders must be signed off by building management.',
    contacts: [
      {
        name: 'Keiko Marlowe',
        title: 'Workplace technology lead',
        email: 'keiko.marlowe@alderbrook-freight.test',
        phone: '+1 415 555 0161',
      },
      {
        name: 'Victor Halden',
        title: 'Building manager',
        email: 'building@alderbrook-freight.test',
        phone: '+1 415 555 0162',
        receivesUpdates: false,
      },
    ],
  },
};

export type SiteKey = 'fMain' | 'fWest' | 'fLake' | 'dHigh' | 'dMiddle' | 'dAdmin' | 'vArena' | 'vHall' | 'fHq';

export const siteSpecs: Record<
  SiteKey,
  {
    client: ClientKey;
    name: string;
    address: string;
    city: string;
    region: string;
    postalCode: string;
    timeZone: string;
    accessNotes: string;
    internalNotes?: string;
    contact: ContactSpec;
  }
> = {
  fMain: {
    client: 'fellowship',
    name: 'Main Campus',
    address: '2200 Cedar Hollow Road',
    city: 'Brantley Springs',
    region: 'TX',
    postalCode: '75089',
    timeZone: 'America/Chicago',
    accessNotes:
      'Loading dock on the north side off Millrace Lane (height 3.8 m, no leveller). Ring facilities on ext. 214 on arrival. ' +
      'Keys to the main hall and the stage-left rack room are held by the facilities manager. Service entry Mon–Sat 07:00–19:00; ' +
      'no work during Sunday services. Park in the staff lot behind the gym.',
    internalNotes: 'Site kit lives in the stage-left rack room, grey case on the bottom shelf.',
    contact: { name: 'Caleb Munroe', title: 'Facilities manager', email: 'facilities.main@cedarhollow.test', phone: '+1 214 555 0133' },
  },
  fWest: {
    client: 'fellowship',
    name: 'West Campus',
    address: '88 Sagebrush Way',
    city: 'Pell Ridge',
    region: 'CO',
    postalCode: '80917',
    timeZone: 'America/Denver',
    accessNotes:
      'Use the east service door next to the kitchen; door code changes monthly, ask the campus admin. ' +
      'Worship centre unlocked Tue–Fri 09:00–16:00. Visitor parking in front; trailers must use the gravel lot.',
    contact: { name: 'Naomi Trevisan', title: 'Campus administrator', email: 'west.campus@cedarhollow.test', phone: '+1 719 555 0134' },
  },
  fLake: {
    client: 'fellowship',
    name: 'Lakeside Campus',
    address: '415 Heron Point Drive',
    city: 'Lake Arlow',
    region: 'TX',
    postalCode: '75473',
    timeZone: 'America/Chicago',
    accessNotes:
      'Youth building is the separate building by the lake. The youth pastor holds the keys; call ahead. ' +
      'Street parking only on weekdays; no access Wednesday evenings (youth night).',
    contact: { name: 'Jesse Oduya', title: 'Youth pastor', email: 'youth.lakeside@cedarhollow.test', phone: '+1 903 555 0135' },
  },
  dHigh: {
    client: 'district',
    name: 'Harrowgate High School',
    address: '600 Scholar Avenue',
    city: 'Harrowgate',
    region: 'OH',
    postalCode: '43390',
    timeZone: 'America/New_York',
    accessNotes:
      'Sign in at the main office with photo ID; the custodian on duty opens the auditorium. Loading door at the back of the stage, ' +
      'reached from the bus loop (no deliveries 07:15–08:00 and 14:30–15:15). Service entry 06:30–21:00 on school days.',
    contact: {
      name: 'Marcus Delacroix-Bell',
      title: 'Auditorium manager',
      email: 'auditorium@harrowgate-usd.test',
      phone: '+1 614 555 0143',
    },
  },
  dMiddle: {
    client: 'district',
    name: 'Pinecrest Middle School',
    address: '1212 Pinecrest Road',
    city: 'Harrowgate',
    region: 'OH',
    postalCode: '43391',
    timeZone: 'America/New_York',
    accessNotes:
      'Front office sign-in. The commons is used for lunch 10:45–13:15: work before or after. ' +
      'Visitor spaces by the flagpole; the head custodian has the lift key.',
    contact: {
      name: 'Patrice Oyelaran',
      title: 'Head custodian',
      email: 'pinecrest.facilities@harrowgate-usd.test',
      phone: '+1 614 555 0144',
    },
  },
  dAdmin: {
    client: 'district',
    name: 'District Administration Center',
    address: '45 Civic Plaza',
    city: 'Harrowgate',
    region: 'OH',
    postalCode: '43390',
    timeZone: 'America/New_York',
    accessNotes:
      'Reception on the ground floor issues a visitor badge. Board room is on the second floor, booked most evenings for meetings: ' +
      'check the room calendar with reception. Parking garage entrance on Mill Street.',
    contact: { name: 'Hannah Szabo-Reyes', title: 'IT technician', email: 'it.helpdesk@harrowgate-usd.test', phone: '+1 614 555 0145' },
  },
  vArena: {
    client: 'venue',
    name: 'Copperline Arena',
    address: '7700 East Foundry Boulevard',
    city: 'Saguaro Flats',
    region: 'AZ',
    postalCode: '85299',
    timeZone: 'America/Phoenix',
    accessNotes:
      'Loading dock 2 (east side), check in with the dock master. The centre-hung wall is lowered on its chain motors only by the venue ' +
      'rigging crew: book them 48 h ahead. The plaza sign is reached by the service ladder behind the box office. Crew parking in lot C.',
    internalNotes: 'Site kit is in the video control room, cage 3; the dock master has the cage key.',
    contact: {
      name: 'Rory Gallagher-Price',
      title: 'Production manager',
      email: 'production@copperline-events.test',
      phone: '+1 480 555 0153',
    },
  },
  vHall: {
    client: 'venue',
    name: 'Copperline Exhibit Hall',
    address: '7750 East Foundry Boulevard',
    city: 'Saguaro Flats',
    region: 'AZ',
    postalCode: '85299',
    timeZone: 'America/Phoenix',
    accessNotes:
      'Marshalling yard on the south side; forklifts have right of way during move-in days. Hall doors open 06:00–23:00. ' +
      "The hall supervisor holds the key to the curved wall's rear walkway.",
    contact: { name: 'Selma Whitford', title: 'Hall supervisor', email: 'exhibit.hall@copperline-events.test', phone: '+1 480 555 0154' },
  },
  fHq: {
    client: 'freight',
    name: 'Headquarters',
    address: '300 Harborlight Way',
    city: 'Port Calloway',
    region: 'CA',
    postalCode: '94999',
    timeZone: 'America/Los_Angeles',
    accessNotes:
      'Service entrance on Quay Street; security desk issues a contractor badge. Lobby work only before 08:00 or after 18:00 on ' +
      'weekdays, any time at weekends with building-management approval. Contractor parking on level P2.',
    contact: {
      name: 'Lena Okoro-Whitfield',
      title: 'Facilities coordinator',
      email: 'facilities@alderbrook-freight.test',
      phone: '+1 415 555 0163',
    },
  },
};

export type ModelKey = 'hx19' | 'hx26' | 'tw39' | 'tw48' | 'mv15';

/**
 * Invented cabinet models. Pixels per cabinet = cabinet size / pitch; powers and weights are typical
 * of the class. The Morrow Vale datasheet at hand gives no power connection figures, so plans for
 * it show what they assume.
 */
export const modelSpecs: Record<
  ModelKey,
  Omit<CabinetModel, 'id' | 'archived'> & {
    /** How this maker writes serials and module batch codes. */
    serialPrefix: string;
    batchPrefix: string;
  }
> = {
  hx19: {
    name: 'Halvard HX 1.9 Interior',
    maker: 'Halvard Display Works',
    widthMm: 500,
    heightMm: 500,
    pixelPitchMm: 1.953,
    pixelsWide: 256,
    pixelsHigh: 256,
    modulesWide: 2,
    modulesHigh: 2,
    maxPowerW: 190,
    typicalPowerW: 65,
    weightKg: 7.6,
    brightnessNits: 800,
    inputVoltageMinV: 100,
    inputVoltageMaxV: 240,
    passThroughAmps: 15,
    maxPerChain: 12,
    maxPowerVA: 200,
    environment: 'indoor',
    serialPrefix: 'HX19',
    batchPrefix: 'H19',
  },
  hx26: {
    name: 'Halvard HX 2.6 Interior',
    maker: 'Halvard Display Works',
    widthMm: 500,
    heightMm: 500,
    pixelPitchMm: 2.604,
    pixelsWide: 192,
    pixelsHigh: 192,
    modulesWide: 2,
    modulesHigh: 2,
    maxPowerW: 180,
    typicalPowerW: 60,
    weightKg: 7.5,
    brightnessNits: 1000,
    inputVoltageMinV: 100,
    inputVoltageMaxV: 240,
    passThroughAmps: 15,
    maxPerChain: 12,
    maxPowerVA: 190,
    environment: 'indoor',
    serialPrefix: 'HX26',
    batchPrefix: 'H26',
  },
  tw39: {
    name: 'Tarnwell TW 3.9 Touring',
    maker: 'Tarnwell Optoelectronics',
    widthMm: 500,
    heightMm: 1000,
    pixelPitchMm: 3.906,
    pixelsWide: 128,
    pixelsHigh: 256,
    modulesWide: 2,
    modulesHigh: 4,
    maxPowerW: 340,
    typicalPowerW: 115,
    weightKg: 12.5,
    brightnessNits: 1200,
    inputVoltageMinV: 100,
    inputVoltageMaxV: 240,
    passThroughAmps: 16,
    maxPerChain: 8,
    maxPowerVA: null,
    environment: 'indoor',
    serialPrefix: 'TW39',
    batchPrefix: 'T39',
  },
  tw48: {
    name: 'Tarnwell TW 4.8 Outdoor',
    maker: 'Tarnwell Optoelectronics',
    widthMm: 500,
    heightMm: 1000,
    pixelPitchMm: 4.81,
    pixelsWide: 104,
    pixelsHigh: 208,
    modulesWide: 2,
    modulesHigh: 4,
    maxPowerW: 420,
    typicalPowerW: 140,
    weightKg: 16.5,
    brightnessNits: 5500,
    inputVoltageMinV: 100,
    inputVoltageMaxV: 240,
    passThroughAmps: 16,
    maxPerChain: 6,
    maxPowerVA: 445,
    environment: 'outdoor',
    serialPrefix: 'TW48',
    batchPrefix: 'T48',
  },
  mv15: {
    name: 'Morrow Vale Slimline 1.5',
    maker: 'Morrow Vale Displays',
    widthMm: 600,
    heightMm: 337.5,
    pixelPitchMm: 1.5625,
    pixelsWide: 384,
    pixelsHigh: 216,
    modulesWide: 2,
    modulesHigh: 2,
    maxPowerW: 110,
    typicalPowerW: 38,
    weightKg: 6.2,
    brightnessNits: 600,
    inputVoltageMinV: 100,
    inputVoltageMaxV: 240,
    passThroughAmps: null,
    maxPerChain: null,
    maxPowerVA: null,
    environment: 'indoor',
    serialPrefix: 'MVS15',
    batchPrefix: 'M15',
  },
};

/** Invented processor line; outputs per model. */
export const controllerModels = {
  qp4: { model: 'Quenlow QP-4 processor', outputs: 4, serialPrefix: 'QL4' },
  qp8: { model: 'Quenlow QP-8 processor', outputs: 8, serialPrefix: 'QL8' },
  qp16: { model: 'Quenlow QP-16 processor', outputs: 16, serialPrefix: 'QL16' },
} as const;

export type WallKey = 'w01' | 'w02' | 'w03' | 'w04' | 'w05' | 'w06' | 'w07' | 'w08' | 'w09' | 'w10' | 'w11' | 'w12';

export interface WallSpec {
  site: SiteKey;
  name: string;
  model: ModelKey;
  columns: number;
  rows: number;
  mounting: Mounting;
  installedDaysAgo: number;
  warrantyYears: number;
  /** How many production batches the original cabinets came from. */
  batches: 2 | 3;
  /** Walls installed together share the production batches of the first one. */
  sharesBatchesWith?: WallKey;
  /** Cabinets swapped at commissioning for units of a later batch. */
  commissioningSwaps: number;
  controller: keyof typeof controllerModels;
  /** The supply the wall was wired from, when its as-built plan (runs by whole rows) is on file. */
  asBuilt?: { voltage: number; phases: 1 | 3; breakerAmps: number; continuousFactor: number };
  firmware: string;
  inputNotes: string;
  internalNotes: string;
}

export const wallSpecs: Record<WallKey, WallSpec> = {
  w01: {
    site: 'fMain',
    name: 'Main hall centre wall',
    model: 'hx26',
    columns: 12,
    rows: 6,
    mounting: 'ground_stacked',
    // As built: 208 V three-phase distro, 20 A circuits, one power chain and one data line per row.
    asBuilt: { voltage: 208, phases: 3, breakerAmps: 20, continuousFactor: 0.8 },
    installedDaysAgo: 790,
    warrantyYears: 5,
    batches: 3,
    commissioningSwaps: 2,
    controller: 'qp8',
    firmware: '4.2.17',
    inputNotes:
      'Program and backup 3840×2160 at 59.94 Hz from the broadcast switcher on HDMI 2.0 (inputs 1 and 2); failover to input 2 is automatic.',
    internalNotes:
      'Ground-stacked on the stage riser; rear access through the stage-left door. Row 4 is fed by power chain 4 from distro B.',
  },
  w02: {
    site: 'fMain',
    name: 'Main hall left side wall',
    model: 'hx26',
    columns: 4,
    rows: 6,
    mounting: 'flown',
    installedDaysAgo: 790,
    warrantyYears: 5,
    batches: 2,
    sharesBatchesWith: 'w01',
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.2.17',
    inputNotes: "Image-magnification feed 1920×1080 from the switcher aux 1, scaled to the wall's portrait canvas.",
    internalNotes: "Flown from the house truss; the church's own rigger must lower it.",
  },
  w03: {
    site: 'fMain',
    name: 'Main hall right side wall',
    model: 'hx26',
    columns: 4,
    rows: 6,
    mounting: 'flown',
    installedDaysAgo: 790,
    warrantyYears: 5,
    batches: 2,
    sharesBatchesWith: 'w01',
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.2.17',
    inputNotes: 'Image-magnification feed 1920×1080 from the switcher aux 2.',
    internalNotes: 'Bottom row runs warm: distro B circuit 6 shared with stage lighting until the church rewired it.',
  },
  w04: {
    site: 'fWest',
    name: 'Worship centre wall',
    model: 'tw39',
    columns: 10,
    rows: 3,
    mounting: 'flown',
    installedDaysAgo: 610,
    warrantyYears: 3,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.1.9',
    inputNotes: '1920×1080 from the production PC over fibre; lyrics and stream program.',
    internalNotes: "Hung from a steel frame engineered by the church's structural consultant; drawings in the as-built folder.",
  },
  w05: {
    site: 'fLake',
    name: 'Youth room wall',
    model: 'hx19',
    columns: 8,
    rows: 4,
    mounting: 'wall_fixed',
    installedDaysAgo: 520,
    warrantyYears: 3,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.1.9',
    inputNotes: 'Laptop on the stage (HDMI wall plate) or the media player; input 1 is the wall plate.',
    internalNotes: 'Low wall in a room used for games: suggested a protective net.',
  },
  w06: {
    site: 'dHigh',
    name: 'Auditorium stage wall',
    model: 'tw39',
    columns: 12,
    rows: 4,
    mounting: 'ground_stacked',
    installedDaysAgo: 880,
    warrantyYears: 3,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '3.9.4',
    inputNotes: 'Stage left HDMI, booth playback and the district streaming encoder, switched in the booth.',
    internalNotes: "Warranty over; repairs are chargeable under the district's service plan.",
  },
  w07: {
    site: 'dMiddle',
    name: 'Commons wall',
    model: 'hx26',
    columns: 8,
    rows: 4,
    mounting: 'wall_fixed',
    installedDaysAgo: 700,
    warrantyYears: 3,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.1.9',
    inputNotes: 'Signage player on input 1, announcements laptop on input 2.',
    internalNotes: 'Fixed to a block wall with a 150 mm service gap; front-serviceable modules.',
  },
  w08: {
    site: 'dAdmin',
    name: 'Board room wall',
    model: 'mv15',
    columns: 4,
    rows: 4,
    mounting: 'wall_fixed',
    installedDaysAgo: 450,
    warrantyYears: 3,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.2.17',
    inputNotes: 'Room system presentation switcher, 1920×1080; preset 1 = laptop, preset 2 = signage.',
    internalNotes: 'Front-serviceable; magnetic module tool is in the credenza.',
  },
  w09: {
    site: 'vArena',
    name: 'Centre-hung main wall',
    model: 'tw39',
    columns: 10,
    rows: 4,
    mounting: 'flown',
    installedDaysAgo: 660,
    warrantyYears: 5,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.2.17',
    inputNotes: 'Show feed 3840×2160 from the arena control room over fibre; backup processor in the same rack.',
    internalNotes: 'Only the venue rigging crew may fly the wall in or out.',
  },
  w10: {
    site: 'vArena',
    name: 'Plaza entrance sign',
    model: 'tw48',
    columns: 8,
    rows: 3,
    mounting: 'wall_fixed',
    installedDaysAgo: 640,
    warrantyYears: 5,
    batches: 2,
    commissioningSwaps: 1,
    controller: 'qp4',
    firmware: '4.2.17',
    inputNotes: 'Signage player in the box-office rack; brightness schedule set in the processor.',
    internalNotes: 'IP65 cabinets; check the rear cable glands after monsoon storms.',
  },
  w11: {
    site: 'vHall',
    name: 'Exhibit hall curved wall',
    model: 'hx26',
    columns: 16,
    rows: 4,
    mounting: 'curved',
    installedDaysAgo: 420,
    warrantyYears: 5,
    batches: 3,
    commissioningSwaps: 2,
    controller: 'qp8',
    firmware: '4.2.17',
    inputNotes: 'Two 1920×1080 feeds stitched side by side (input 1 left half, input 2 right half).',
    internalNotes: '5° curve between every column; curve locks must be checked after each move-in.',
  },
  w12: {
    site: 'fHq',
    name: 'Lobby feature wall',
    model: 'mv15',
    columns: 10,
    rows: 8,
    mounting: 'wall_fixed',
    installedDaysAgo: 560,
    warrantyYears: 5,
    batches: 3,
    commissioningSwaps: 2,
    controller: 'qp16',
    firmware: '4.2.17',
    inputNotes: 'Brand content player 3840×1728 native canvas on input 1; reception PC on input 2.',
    internalNotes: 'Front-serviceable. Lobby closes to the public 18:00; building management must approve the lift.',
  },
};

/** Staff and client accounts. All use the demo password. */
export const staffUsers = {
  admin: { email: 'admin@gridkeep.test', name: 'Marisol Vantreece', role: 'admin', phone: '+1 214 555 0101' },
  office: { email: 'office@gridkeep.test', name: 'Priya Halloway', role: 'coordinator', phone: '+1 214 555 0102' },
  tech1: { email: 'tech@gridkeep.test', name: 'Jonah Ellery', role: 'technician', phone: '+1 214 555 0103' },
  tech2: { email: 'tech2@gridkeep.test', name: 'Rafael Dunmore', role: 'technician', phone: '+1 214 555 0104' },
} as const;

export type ClientUserKey = 'fellowshipAv' | 'fellowshipMedia' | 'districtAv' | 'venueAv' | 'freightAv';

export const clientUsers: Record<ClientUserKey, { email: string; name: string; client: ClientKey; phone: string }> = {
  fellowshipAv: { email: 'av@cedarhollow.test', name: 'Tobias Wrenfield', client: 'fellowship', phone: '+1 214 555 0131' },
  fellowshipMedia: { email: 'media@cedarhollow.test', name: 'Hollis Brandtner', client: 'fellowship', phone: '+1 214 555 0136' },
  districtAv: { email: 'av@harrowgate-usd.test', name: 'Lorna Pickett', client: 'district', phone: '+1 614 555 0141' },
  venueAv: { email: 'av@copperline-events.test', name: 'Desmond Achterberg', client: 'venue', phone: '+1 480 555 0151' },
  freightAv: { email: 'av@alderbrook-freight.test', name: 'Keiko Marlowe', client: 'freight', phone: '+1 415 555 0161' },
};

export const DEMO_PASSWORD = 'gridkeep-demo';

export type PartKey =
  'modHx19' | 'modHx26' | 'modTw39' | 'modTw48' | 'modMv15' | 'psu200' | 'psu300' | 'rxc' | 'dataCable' | 'powerCable' | 'fan';

export const partSpecs: Record<
  PartKey,
  {
    sku: string;
    name: string;
    kind: 'module' | 'power_supply' | 'receiving_card' | 'cable' | 'fan';
    model?: ModelKey;
    unitCost: string;
    leadTimeDays: number;
    /** Modules carry the batch code of their production run. */
    batched: boolean;
  }
> = {
  modHx19: {
    sku: 'MOD-HX19',
    name: 'LED module 250×250 mm, 1.9 mm (HX 1.9)',
    kind: 'module',
    model: 'hx19',
    unitCost: '148.00',
    leadTimeDays: 35,
    batched: true,
  },
  modHx26: {
    sku: 'MOD-HX26',
    name: 'LED module 250×250 mm, 2.6 mm (HX 2.6)',
    kind: 'module',
    model: 'hx26',
    unitCost: '112.00',
    leadTimeDays: 35,
    batched: true,
  },
  modTw39: {
    sku: 'MOD-TW39',
    name: 'LED module 250×250 mm, 3.9 mm (TW 3.9)',
    kind: 'module',
    model: 'tw39',
    unitCost: '86.00',
    leadTimeDays: 42,
    batched: true,
  },
  modTw48: {
    sku: 'MOD-TW48',
    name: 'LED module 250×250 mm, 4.8 mm outdoor (TW 4.8)',
    kind: 'module',
    model: 'tw48',
    unitCost: '124.00',
    leadTimeDays: 42,
    batched: true,
  },
  modMv15: {
    sku: 'MOD-MV15',
    name: 'LED module 300×168.75 mm, 1.5 mm (Slimline 1.5)',
    kind: 'module',
    model: 'mv15',
    unitCost: '196.00',
    leadTimeDays: 49,
    batched: true,
  },
  psu200: {
    sku: 'PSU-5V200',
    name: 'Power supply 5 V 200 W, indoor cabinet',
    kind: 'power_supply',
    unitCost: '38.50',
    leadTimeDays: 14,
    batched: false,
  },
  psu300: {
    sku: 'PSU-5V300-OD',
    name: 'Power supply 5 V 300 W, sealed outdoor',
    kind: 'power_supply',
    model: 'tw48',
    unitCost: '64.00',
    leadTimeDays: 21,
    batched: false,
  },
  rxc: { sku: 'RXC-A8', name: 'Receiving card A8', kind: 'receiving_card', unitCost: '59.00', leadTimeDays: 21, batched: false },
  dataCable: {
    sku: 'CBL-DATA-06',
    name: 'Cat6 data jumper 0.6 m, locking',
    kind: 'cable',
    unitCost: '6.20',
    leadTimeDays: 7,
    batched: false,
  },
  powerCable: { sku: 'CBL-PWR-06', name: 'Power jumper 0.6 m, locking', kind: 'cable', unitCost: '9.80', leadTimeDays: 7, batched: false },
  fan: { sku: 'FAN-80-IP', name: 'Cabinet fan 80 mm, sealed', kind: 'fan', unitCost: '14.00', leadTimeDays: 14, batched: false },
};

export const moduleForModel: Record<ModelKey, PartKey> = {
  hx19: 'modHx19',
  hx26: 'modHx26',
  tw39: 'modTw39',
  tw48: 'modTw48',
  mv15: 'modMv15',
};

export type LocationKey = 'warehouse' | 'van1' | 'van2' | 'kitMain' | 'kitArena';

export const locationSpecs: Record<
  LocationKey,
  { name: string; kind: 'warehouse' | 'van' | 'site_kit'; holder?: 'tech1' | 'tech2'; site?: SiteKey }
> = {
  warehouse: { name: 'Brantley Springs warehouse', kind: 'warehouse' },
  van1: { name: 'Van 1 (Jonah Ellery)', kind: 'van', holder: 'tech1' },
  van2: { name: 'Van 2 (Rafael Dunmore)', kind: 'van', holder: 'tech2' },
  kitMain: { name: 'Site kit: Cedar Hollow Main Campus', kind: 'site_kit', site: 'fMain' },
  kitArena: { name: 'Site kit: Copperline Arena', kind: 'site_kit', site: 'vArena' },
};

/** Which technician usually covers a client. */
export const usualTechnician: Record<ClientKey, 'tech1' | 'tech2'> = {
  fellowship: 'tech1',
  district: 'tech2',
  venue: 'tech2',
  freight: 'tech1',
};

export const maintenanceChecklist = [
  'Clean the display surface and air vents',
  'Check fans and filters',
  'Check power and data connectors',
  'Check for dead pixels and dark modules',
  'Check the processor firmware and back up its configuration',
  'Recalibrate where modules no longer match',
];

export const repairChecklist = [
  'Power isolated before opening the cabinet',
  'ESD wrist strap worn for module work',
  'Fault confirmed on site',
  'Repair tested on full white, red, green and blue',
  'Result shown to the client',
];
