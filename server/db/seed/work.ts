// The demo's service history: about eight months of tickets, visits and repairs, told as specs
// that the builder turns into rows. Ages count back from today; positions are C{column}·R{row}
// from the top-left as seen from the audience.
import type {
  RemovedPartFate,
  RepairAction,
  RepairComponent,
  RepairFault,
  TicketPriority,
  TicketScope,
  TicketStatus,
} from '../../../shared/schemas/enums.js';
import type { ClientUserKey, PartKey, SiteKey, WallKey } from './register.js';

export interface RepairSpec {
  column: number;
  row: number;
  component: RepairComponent;
  /** Module position inside the cabinet, [column, row]. */
  module?: [number, number];
  fault: RepairFault;
  action: RepairAction;
  part?: PartKey;
  /** Module batch: the cabinet's own (default) or the newest batch on the shelf. */
  batch?: 'cabinet' | 'later';
  /** Where the spare came from: the site kit when the site has one (default), else the technician's van. */
  from?: 'kit' | 'van';
  fate?: RemovedPartFate;
  notes: string;
}

export interface TicketSpec {
  key: string;
  wall?: WallKey;
  /** Only for tickets without a wall. */
  site?: SiteKey;
  scope?: TicketScope;
  cells?: [number, number][];
  title: string;
  description: string;
  priority: TicketPriority;
  status: TicketStatus;
  /** Opened this many days ago at `hour` local time … */
  ageDays?: number;
  hour?: number;
  /** … or this many hours ago. */
  hoursAgo?: number;
  reporter: ClientUserKey | 'office';
  tech?: 'tech1' | 'tech2';
  /** Days from opening to the visit (default by priority); none for tickets handled remotely. */
  visitAfterDays?: number;
  noVisit?: boolean;
  repairs?: RepairSpec[];
  /** The technician's public account of the fix (also the visit summary). */
  resolution?: string;
  internal?: string[];
  /** The question put to the client while waiting on them. */
  ask?: string;
  /** The public note while waiting for parts. */
  partsNote?: string;
  /** The client's reply when the ticket closes. */
  thanks?: string;
}

export const ticketSpecs: TicketSpec[] = [
  // Main hall centre wall: C7·R4 keeps failing (power chain 4), C10·R2 got a mismatched module.
  {
    key: 'T01', wall: 'w01', cells: [[7, 4]], priority: 'high', status: 'closed', ageDays: 228, hour: 10,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'Dead module at C7·R4',
    description: 'During Sunday rehearsal the lower-left quarter of the cabinet at C7·R4 went black. The rest of the wall is fine.',
    repairs: [{ column: 7, row: 4, component: 'module', module: [1, 2], fault: 'dead_module', action: 'replaced', part: 'modHx26', fate: 'to_bench', notes: 'Module 1,2 dark, no response after reseating. Replaced with a spare from the cabinet\'s own batch.' }],
    resolution: 'Replaced the dead module at C7·R4 (lower left) with a spare from the wall\'s own batch. Tested on full white and grey fields: no visible difference.',
    thanks: 'Looks perfect, thank you.',
  },
  {
    key: 'T02', wall: 'w01', cells: [[7, 4]], priority: 'high', status: 'closed', ageDays: 171, hour: 9,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'C7·R4 dark again',
    description: 'The same cabinet as last time (C7·R4) is completely dark since this morning. Everything around it works.',
    repairs: [{ column: 7, row: 4, component: 'receiving_card', fault: 'no_signal', action: 'replaced', part: 'rxc', fate: 'to_bench', notes: 'Receiving card status LED off although data arrives at its input. Replaced the card and loaded the configuration from the processor.' }],
    resolution: 'The receiving card in C7·R4 had failed. Fitted a new card and loaded the wall configuration; the cabinet is back.',
    internal: ['Second call on C7·R4 in two months. Old card to the bench for testing.'],
  },
  {
    key: 'T03', wall: 'w01', cells: [[7, 4], [8, 4]], priority: 'high', status: 'closed', ageDays: 128, hour: 19,
    reporter: 'fellowshipMedia', tech: 'tech1',
    title: 'Flicker on C7·R4 and C8·R4 during services',
    description: 'The two cabinets at C7·R4 and C8·R4 flicker for a second every few minutes. It shows on the live stream.',
    repairs: [
      { column: 7, row: 4, component: 'data_cable', fault: 'flicker', action: 'replaced', part: 'dataCable', fate: 'scrapped', notes: 'Data jumper from C6·R4 into C7·R4 had a cracked latch and moved when touched. Replaced.' },
      { column: 8, row: 4, component: 'power_cable', fault: 'flicker', action: 'reseated', notes: 'Power jumper into C8·R4 not fully home. Reseated and locked.' },
    ],
    resolution: 'Replaced a damaged data cable feeding C7·R4 and reseated the power connection of C8·R4. No flicker over a 30-minute test loop.',
    internal: ['Third visit to the middle of row 4. Row 4 is power chain 4 from distro B: measure the voltage at C7·R4 next time.'],
  },
  {
    key: 'T04', wall: 'w01', cells: [[7, 4]], priority: 'high', status: 'closed', ageDays: 44, hour: 8,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'C7·R4 blinking on and off',
    description: 'C7·R4 blinks off and on roughly every 30 seconds. It started during the Saturday evening service.',
    repairs: [{ column: 7, row: 4, component: 'power_supply', fault: 'flicker', action: 'replaced', part: 'psu200', fate: 'to_vendor_return', notes: 'Supply output sagging to 4.3 V under load. Replaced; failed unit held for a warranty return.' }],
    resolution: 'The power supply in C7·R4 was failing under load. Fitted a new one; the cabinet is stable. The faulty supply goes back to the maker under warranty.',
    internal: ['Fourth call on this cell. If it comes back, have the church\'s electrician check distro B circuit 4 before we swap more parts.'],
  },
  {
    key: 'T05', wall: 'w01', cells: [[7, 4]], priority: 'normal', status: 'waiting_parts', ageDays: 6, hour: 11,
    reporter: 'fellowshipAv', tech: 'tech1', visitAfterDays: 1,
    title: 'Intermittent dropouts at C7·R4',
    description: 'Very short dropouts on C7·R4 again this week, a fraction of a second, a few times per service.',
    repairs: [{ column: 7, row: 4, component: 'receiving_card', fault: 'flicker', action: 'reseated', notes: 'Reseated the receiving card and both data connectors. Dropouts rarer but not gone. Card is the older hardware revision.' }],
    resolution: 'Reseated the receiving card as a stop-gap.',
    partsNote: 'We have reseated the card as a stop-gap and ordered a receiving card of the current hardware revision. We will book the swap as soon as it arrives.',
    internal: ['Ordered 2 receiving cards, current revision, from the maker (about 10 days). Measure distro B circuit 4 under full white while on site.'],
  },
  {
    key: 'T06', wall: 'w01', cells: [[3, 5]], priority: 'critical', status: 'closed', ageDays: 133, hour: 7,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'Cabinet C3·R5 dark after a roof leak',
    description: 'There was a roof leak over the stage overnight. Cabinet C3·R5 is dark and its back cover has water stains. Power to the wall is off until you say it is safe.',
    repairs: [{ column: 3, row: 5, component: 'whole_cabinet', fault: 'physical_damage', action: 'cabinet_swapped', fate: 'to_bench', notes: 'Corrosion on the backplane and one module. Swapped in the spare cabinet from the site kit; wet cabinet to the bench.' }],
    resolution: 'Dried and checked the neighbouring cabinets, swapped C3·R5 for the spare cabinet kept on site and brought the wall back up. The damaged cabinet is at our bench.',
    internal: ['Wet cabinet at the bench: backplane corroded, not economical to repair. Retire it and order a replacement spare cabinet for the site kit.'],
    thanks: 'Thank you for coming out so early.',
  },
  {
    key: 'T07', wall: 'w01', cells: [[10, 2]], priority: 'high', status: 'closed', ageDays: 88, hour: 10,
    reporter: 'fellowshipMedia', tech: 'tech1',
    title: 'Dead module at C10·R2',
    description: 'The top-right module of the cabinet at C10·R2 is dark.',
    repairs: [{ column: 10, row: 2, component: 'module', module: [2, 1], fault: 'dead_module', action: 'replaced', part: 'modHx26', batch: 'later', from: 'van', fate: 'to_bench', notes: 'Rack room with the site kit was locked (facilities away); fitted a module from the van, which only had the newer batch, to get the wall back before Sunday.' }],
    resolution: 'Replaced the dead module at C10·R2 so the wall is complete for Sunday. The spare comes from a newer production batch; we will swap it for a matching one.',
    internal: ['Later-batch module fitted as a stop-gap: expect a slight colour difference on grey. Swap for a batch-matched module at the next visit.'],
  },
  {
    key: 'T08', wall: 'w01', cells: [[10, 2]], priority: 'normal', status: 'closed', ageDays: 74, hour: 14,
    reporter: 'fellowshipMedia', tech: 'tech1',
    title: 'Colour shift after the module swap at C10·R2',
    description: 'Since the module was replaced at C10·R2 that corner looks slightly pink on white and grey backgrounds.',
    repairs: [{ column: 10, row: 2, component: 'module', module: [2, 1], fault: 'colour_shift', action: 'replaced', part: 'modHx26', fate: 'to_bench', notes: 'Replaced the later-batch module with one from the cabinet\'s own batch. Colour matches on grey.' }],
    resolution: 'Fitted a module from the wall\'s own production batch at C10·R2. The colour now matches its neighbours.',
  },
  {
    key: 'T09', wall: 'w01', scope: 'controller', priority: 'high', status: 'closed', ageDays: 152, hour: 9,
    reporter: 'fellowshipAv', tech: 'tech1', noVisit: true,
    title: 'Centre wall freezes on one frame',
    description: 'Twice this week the centre wall froze on one frame when the switcher changed source. The side walls kept working.',
    resolution: 'The processor ran an older firmware that can freeze when its input drops for a moment. We updated it remotely with your production team on the line; the freeze could not be reproduced afterwards.',
  },
  // Side walls.
  {
    key: 'T10', wall: 'w02', cells: [[2, 5]], priority: 'low', status: 'closed', ageDays: 205, hour: 13,
    reporter: 'fellowshipMedia', tech: 'tech1',
    title: 'A few dead pixels on the left side wall',
    description: 'A small cluster of dead pixels near the bottom of the left side wall, second column from the left, second row from the bottom (C2·R5).',
    repairs: [{ column: 2, row: 5, component: 'module', module: [1, 2], fault: 'dead_pixels', action: 'replaced', part: 'modHx26', fate: 'to_bench', notes: 'Seven dead pixels in one cluster on module 1,2. Replaced.' }],
    resolution: 'Replaced the module with the dead pixels at C2·R5.',
  },
  {
    key: 'T11', wall: 'w03', cells: [[1, 6], [2, 6], [3, 6], [4, 6]], priority: 'high', status: 'closed', ageDays: 119, hour: 18,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'Flicker on the bottom row of the right side wall',
    description: 'The whole bottom row of the right side wall flickers whenever the wall shows bright content.',
    repairs: [{ column: 1, row: 6, component: 'power_cable', fault: 'flicker', action: 'replaced', part: 'powerCable', fate: 'scrapped', notes: 'Power feed into C1·R6, first cabinet of the bottom-row chain, discoloured by heat at the connector. Replaced the jumper.' }],
    resolution: 'The power connection feeding the bottom row was overheating. Replaced it; no flicker on full white. Please have your electrician check the circuit that feeds this wall.',
    internal: ['Circuit shared with stage lighting. Told facilities; they will move the wall to its own circuit.'],
  },
  {
    key: 'T12', wall: 'w03', scope: 'whole_wall', priority: 'low', status: 'waiting_client', ageDays: 12, hour: 16,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'Right side wall looks dimmer than the left',
    description: 'On the same slide the right side wall looks a little dimmer than the left one. Is that expected?',
    ask: 'Both walls are set to the same brightness in the processor, so a calibration check is the next step. It takes about two hours with the walls on. Which weekday morning suits you?',
  },
  // West Campus.
  {
    key: 'T13', wall: 'w04', cells: [[5, 2]], priority: 'normal', status: 'closed', ageDays: 192, hour: 10,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'Module out at C5·R2',
    description: 'One module in the upper half of the cabinet at C5·R2 shows nothing; the rest of the cabinet works.',
    repairs: [{ column: 5, row: 2, component: 'module', module: [2, 1], fault: 'dead_module', action: 'replaced', part: 'modTw39', fate: 'to_bench', notes: 'Module 2,1 dead. Replaced with a batch-matched spare.' }],
    resolution: 'Replaced the dead module at C5·R2 with a spare from the wall\'s batch.',
  },
  {
    key: 'T14', wall: 'w04', scope: 'whole_wall', priority: 'normal', status: 'resolved', ageDays: 9, hour: 15,
    reporter: 'fellowshipAv', tech: 'tech1', visitAfterDays: 2,
    title: 'West Campus wall flickers on camera',
    description: 'The new broadcast camera shows rolling bands on the LED wall. It looks fine to the eye.',
    repairs: [{ column: 1, row: 1, component: 'receiving_card', fault: 'flicker', action: 'recalibrated', notes: 'Raised the refresh rate to 3840 Hz and matched the scan setting on all receiving cards from the processor.' }],
    resolution: 'Raised the wall\'s refresh rate and adjusted the receiving-card settings. No banding on the camera at 1/60 or 1/50 shutter. Please confirm on Sunday\'s stream.',
  },
  {
    key: 'T15', wall: 'w04', cells: [[9, 3]], priority: 'high', status: 'in_progress', ageDays: 1, hour: 8,
    reporter: 'fellowshipAv', tech: 'tech1',
    title: 'Dark cabinet at C9·R3',
    description: 'The cabinet at C9·R3 has been completely dark since yesterday evening.',
    internal: ['On site. No power at the cabinet\'s input: tracing the feed upstream from C8·R3.'],
  },
  // Lakeside youth room.
  {
    key: 'T16', wall: 'w05', cells: [[4, 2]], priority: 'normal', status: 'closed', ageDays: 178, hour: 11,
    reporter: 'fellowshipMedia', tech: 'tech2',
    title: 'Dead module at C4·R2',
    description: 'The bottom-left module of the cabinet at C4·R2 is out.',
    repairs: [{ column: 4, row: 2, component: 'module', module: [1, 2], fault: 'dead_module', action: 'replaced', part: 'modHx19', fate: 'to_bench', notes: 'Module 1,2 dead. Replaced with a batch-matched spare.' }],
    resolution: 'Replaced the dead module at C4·R2.',
  },
  {
    key: 'T17', wall: 'w05', cells: [[6, 3]], priority: 'low', status: 'closed', ageDays: 61, hour: 16,
    reporter: 'fellowshipMedia', tech: 'tech2',
    title: 'Dented module after a ball hit the youth room wall',
    description: 'A ball hit the wall during youth night. The module at C6·R3 has a dent and a few pixels are out.',
    repairs: [{ column: 6, row: 3, component: 'module', module: [2, 2], fault: 'physical_damage', action: 'replaced', part: 'modHx19', fate: 'scrapped', notes: 'Module 2,2 dented, three pixels knocked off. Replaced; damaged module scrapped.' }],
    resolution: 'Replaced the damaged module at C6·R3. A net or a no-ball zone in front of the wall would prevent a repeat.',
    internal: ['Not covered by warranty (impact damage): chargeable.'],
  },
  {
    key: 'T18', wall: 'w05', scope: 'whole_wall', priority: 'critical', status: 'closed', ageDays: 31, hour: 7,
    reporter: 'fellowshipAv', tech: 'tech2',
    title: 'Youth room wall will not turn on',
    description: 'Nothing on the wall at all this morning; the processor shows a signal. We have a service at 10:00.',
    repairs: [{ column: 1, row: 1, component: 'power_cable', fault: 'other', action: 'reseated', notes: 'Breaker for the wall\'s second circuit had tripped and the power jumper into C1·R1 was half out after the room was rearranged. Reseated, reset the breaker, full-white test.' }],
    resolution: 'A tripped breaker and a loose power connection after the room was rearranged. Reset and reseated; the wall was up by 08:40.',
    thanks: 'Made it with time to spare. Thanks!',
  },
  // Harrowgate High School auditorium.
  {
    key: 'T19', wall: 'w06', cells: [[3, 2]], priority: 'normal', status: 'closed', ageDays: 212, hour: 10,
    reporter: 'districtAv', tech: 'tech2',
    title: 'Stripe of dead pixels on the auditorium wall',
    description: 'A thin horizontal line of dead pixels across one cabinet at C3·R2.',
    repairs: [{ column: 3, row: 2, component: 'module', module: [1, 3], fault: 'dead_pixels', action: 'replaced', part: 'modTw39', fate: 'to_bench', notes: 'One row of pixels dead across module 1,3 (driver chip). Replaced.' }],
    resolution: 'Replaced the module with the dead line at C3·R2.',
  },
  {
    key: 'T20', wall: 'w06', scope: 'whole_wall', priority: 'critical', status: 'closed', ageDays: 101, hour: 7,
    reporter: 'districtAv', tech: 'tech2',
    title: 'No signal after a storm',
    description: 'After last night\'s thunderstorm the auditorium wall shows "no signal". Graduation rehearsal is at 13:00.',
    repairs: [
      { column: 1, row: 1, component: 'receiving_card', fault: 'no_signal', action: 'replaced', part: 'rxc', fate: 'to_bench', notes: 'First receiving card of data run 1 dead after the surge; nothing downstream lit.' },
      { column: 1, row: 1, component: 'data_cable', fault: 'no_signal', action: 'replaced', part: 'dataCable', fate: 'scrapped', notes: 'Processor-to-C1·R1 cable jacket burnt at the rack end. Replaced.' },
    ],
    resolution: 'The storm surge took out the first receiving card and its data cable. Both replaced; the whole wall is back. We recommend a surge protector for the processor rack (quote to follow).',
    internal: ['Quote a rack surge protector and UPS to the district technology office.'],
    thanks: 'Rehearsal went ahead on time. Much appreciated.',
  },
  {
    key: 'T21', wall: 'w06', cells: [[10, 4]], priority: 'high', status: 'resolved', ageDays: 4, hour: 13,
    reporter: 'districtAv', tech: 'tech2', visitAfterDays: 1,
    title: 'Bottom-right cabinet flickering',
    description: 'C10·R4 flickers in the auditorium; you can see it from the front rows.',
    repairs: [{ column: 10, row: 4, component: 'data_cable', fault: 'flicker', action: 'reseated', notes: 'Data connector on C10·R4 unlatched after the drama club\'s set build. Reseated and strain-relieved.' }],
    resolution: 'A data connector at C10·R4 had been knocked loose behind the wall. Reseated and secured; no flicker on a 20-minute test.',
  },
  {
    key: 'T22', site: 'dHigh', scope: 'site', priority: 'low', status: 'new', hoursAgo: 5,
    reporter: 'districtAv',
    title: 'Quote for extending the auditorium wall',
    description: 'We would like a quote to add two columns to the auditorium wall for next school year. Is the same cabinet still available?',
  },
  // Pinecrest Middle School commons.
  {
    key: 'T23', wall: 'w07', cells: [[2, 1]], priority: 'normal', status: 'closed', ageDays: 143, hour: 9,
    reporter: 'districtAv', tech: 'tech2',
    title: 'Dead module top-left of the commons wall',
    description: 'The module at the top-left of the commons wall (cabinet C2·R1) is dark.',
    repairs: [{ column: 2, row: 1, component: 'module', module: [1, 1], fault: 'dead_module', action: 'replaced', part: 'modHx26', fate: 'to_bench', notes: 'Module 1,1 dead. Replaced with a batch-matched spare.' }],
    resolution: 'Replaced the dead module at C2·R1 before lunch service.',
  },
  {
    key: 'T24', wall: 'w07', cells: [[5, 3]], priority: 'low', status: 'acknowledged', ageDays: 3, hour: 14,
    reporter: 'districtAv', tech: 'tech2',
    title: 'Slightly different colour patch at C5·R3',
    description: 'On grey backgrounds the cabinet at C5·R3 looks a bit warmer than its neighbours.',
    internal: ['Check the batch of C5·R3 against its neighbours before recalibrating: it may be a commissioning replacement.'],
  },
  {
    key: 'T25', wall: 'w07', cells: [[8, 4]], priority: 'high', status: 'scheduled', ageDays: 2, hour: 8,
    reporter: 'districtAv', tech: 'tech2',
    title: 'Cabinet C8·R4 dark',
    description: 'The bottom-right cabinet of the commons wall has been dark since yesterday morning.',
  },
  // District board room.
  {
    key: 'T26', wall: 'w08', cells: [[2, 2]], priority: 'normal', status: 'closed', ageDays: 116, hour: 10,
    reporter: 'districtAv', tech: 'tech2',
    title: 'Line of dead pixels on the board room wall',
    description: 'A short vertical line of dead pixels on the board room wall, cabinet C2·R2.',
    repairs: [{ column: 2, row: 2, component: 'module', module: [2, 1], fault: 'dead_pixels', action: 'replaced', part: 'modMv15', fate: 'to_bench', notes: 'Column of dead pixels on module 2,1. Replaced from the front with the module tool.' }],
    resolution: 'Replaced the module with the dead column at C2·R2.',
  },
  {
    key: 'T27', wall: 'w08', scope: 'controller', priority: 'low', status: 'closed', ageDays: 52, hour: 17,
    reporter: 'office', tech: 'tech2', noVisit: true,
    title: 'Board room wall shows the wrong input',
    description: 'Phoned in by the district IT technician: the wall shows the lobby signage instead of the laptop when a meeting starts.',
    resolution: 'The processor\'s preset 2 still pointed at the signage player. Corrected it with the district IT technician over the phone.',
  },
  // Copperline Arena.
  {
    key: 'T28', wall: 'w09', cells: [[6, 2]], priority: 'critical', status: 'closed', ageDays: 82, hour: 22,
    reporter: 'venueAv', tech: 'tech2', visitAfterDays: 0,
    title: 'Centre-hung: cabinet C6·R2 dark during a show',
    description: 'Cabinet C6·R2 went dark in the middle of tonight\'s concert. Another show tomorrow at 19:00.',
    repairs: [{ column: 6, row: 2, component: 'power_supply', fault: 'other', action: 'replaced', part: 'psu200', fate: 'to_bench', notes: 'No output from the power supply. Replaced from the site kit after the wall was flown in.' }],
    resolution: 'The power supply in C6·R2 had failed. Replaced overnight from the spares kept at the arena; the wall was flown back out before the morning call.',
  },
  {
    key: 'T29', wall: 'w09', cells: [[3, 4]], priority: 'high', status: 'closed', ageDays: 36, hour: 11,
    reporter: 'venueAv', tech: 'tech2',
    title: 'Bottom-row module blinking at C3·R4',
    description: 'One module on the bottom row (cabinet C3·R4) blinks during shows.',
    repairs: [{ column: 3, row: 4, component: 'module', module: [2, 3], fault: 'flicker', action: 'replaced', part: 'modTw39', fate: 'to_bench', notes: 'Module 2,3 flickering with a cold solder joint on its connector. Replaced from the site kit.' }],
    resolution: 'Replaced the blinking module at C3·R4 from the arena\'s spares.',
  },
  {
    key: 'T30', wall: 'w09', scope: 'whole_wall', priority: 'low', status: 'scheduled', ageDays: 5, hour: 15,
    reporter: 'venueAv', tech: 'tech2',
    title: 'Fan noise from the centre-hung wall in quiet moments',
    description: 'During quiet parts of a show there is a faint whine from the wall; we think it is a fan.',
  },
  {
    key: 'T31', wall: 'w10', cells: [[4, 1]], priority: 'critical', status: 'closed', ageDays: 56, hour: 6,
    reporter: 'venueAv', tech: 'tech2', visitAfterDays: 0,
    title: 'Plaza sign: top cabinet dark after rain',
    description: 'After the storm last night the top cabinet at C4·R1 of the plaza sign is dark.',
    repairs: [{ column: 4, row: 1, component: 'power_supply', fault: 'physical_damage', action: 'replaced', part: 'psu300', fate: 'to_vendor_return', notes: 'Water in through a cracked rear cable gland; power supply corroded. Replaced the supply and the gland.' }],
    resolution: 'Water had entered C4·R1 through a cracked cable gland and damaged its power supply. Replaced both and resealed; the sign is back.',
    internal: ['Failed supply returned to the maker under warranty. Site kit now has no outdoor supply: reorder.'],
  },
  {
    key: 'T32', wall: 'w10', cells: [[7, 2]], priority: 'normal', status: 'closed', ageDays: 21, hour: 9,
    reporter: 'venueAv', tech: 'tech2',
    title: 'Fan fault alarm on the plaza sign',
    description: 'The processor reports a fan fault on C7·R2 of the plaza sign.',
    repairs: [{ column: 7, row: 2, component: 'fan', fault: 'other', action: 'replaced', part: 'fan', fate: 'scrapped', notes: 'Fan bearing seized. Replaced from the site kit.' }],
    resolution: 'Replaced the seized cooling fan in C7·R2.',
  },
  {
    key: 'T33', wall: 'w10', scope: 'whole_wall', priority: 'low', status: 'waiting_client', ageDays: 8, hour: 21,
    reporter: 'venueAv', tech: 'tech2',
    title: 'Plaza sign too bright at night',
    description: 'Neighbours say the plaza sign is too bright after dark.',
    ask: 'We can set a brightness schedule in the processor (for example full brightness by day, 25 % after sunset). Which night level and times would you like, and does the city permit set a limit?',
  },
  // Exhibit hall.
  {
    key: 'T34', wall: 'w11', cells: [[9, 3], [10, 3]], priority: 'normal', status: 'acknowledged', ageDays: 4, hour: 10,
    reporter: 'venueAv', tech: 'tech2',
    title: 'Visible seam between C9·R3 and C10·R3',
    description: 'A thin dark line runs between C9·R3 and C10·R3 on the curved wall. You can see it from the first rows.',
  },
  {
    key: 'T35', wall: 'w11', cells: [[12, 1]], priority: 'high', status: 'waiting_parts', ageDays: 10, hour: 9,
    reporter: 'venueAv', tech: 'tech2', visitAfterDays: 1,
    title: 'Dead module at C12·R1',
    description: 'A module in the top row at C12·R1 is dark.',
    resolution: 'Confirmed a dead module at C12·R1 (top right of the cabinet).',
    partsNote: 'No module from this wall\'s production batch is in stock, and a module from another batch would show as a different colour. We have ordered batch-matched modules and will fit one as soon as they arrive.',
    internal: ['Ordered 4 batch-matched MOD-HX26 from the maker, about 5 weeks. Client agreed to leave it until then (top edge, above the sight lines).'],
  },
  {
    key: 'T36', wall: 'w11', cells: [[1, 4]], priority: 'high', status: 'closed', ageDays: 66, hour: 7,
    reporter: 'venueAv', tech: 'tech2',
    title: 'Module cracked during load-in',
    description: 'A forklift clipped the bottom-left corner of the curved wall during load-in; one module at C1·R4 is cracked.',
    repairs: [{ column: 1, row: 4, component: 'module', module: [1, 2], fault: 'physical_damage', action: 'replaced', part: 'modHx26', fate: 'scrapped', notes: 'Module 1,2 cracked across its face. Replaced; checked the curve lock on C1–C2.' }],
    resolution: 'Replaced the cracked module at C1·R4 and checked the cabinet alignment.',
    internal: ['Impact damage: chargeable to the exhibitor via the venue.'],
  },
  // Alderbrook lobby.
  {
    key: 'T37', wall: 'w12', cells: [[5, 4]], priority: 'normal', status: 'closed', ageDays: 182, hour: 9,
    reporter: 'freightAv', tech: 'tech1',
    title: 'Dead pixels in the lobby wall at C5·R4',
    description: 'A few dead pixels near the middle of the lobby wall (C5·R4); visitors notice them at the reception desk.',
    repairs: [{ column: 5, row: 4, component: 'module', module: [1, 1], fault: 'dead_pixels', action: 'replaced', part: 'modMv15', fate: 'to_bench', notes: 'Four dead pixels on module 1,1. Replaced from the front before opening hours.' }],
    resolution: 'Replaced the module with dead pixels at C5·R4 before the lobby opened.',
  },
  {
    key: 'T38', wall: 'w12', scope: 'whole_wall', priority: 'normal', status: 'closed', ageDays: 93, hour: 12,
    reporter: 'freightAv', tech: 'tech1',
    title: 'Lobby wall looks green-tinted',
    description: 'Visitors mention the lobby wall looks a little green on white backgrounds, mostly on the right half.',
    repairs: [{ column: 8, row: 4, component: 'receiving_card', fault: 'colour_shift', action: 'recalibrated', notes: 'Cards in columns 6–10 were running an older calibration file after a processor restore. Reloaded the stored calibration data.' }],
    resolution: 'Part of the wall was running an older calibration file after a processor restore. Reloaded the correct calibration; white is even across the wall.',
  },
  {
    key: 'T39', wall: 'w12', cells: [[10, 8]], priority: 'high', status: 'new', hoursAgo: 2,
    reporter: 'freightAv',
    title: 'Bottom-right cabinet of the lobby wall is off',
    description: 'The cabinet in the bottom-right corner (C10·R8) has been black since this morning.',
  },
  {
    key: 'T40', wall: 'w12', cells: [[2, 7]], priority: 'normal', status: 'scheduled', ageDays: 3, hour: 10,
    reporter: 'freightAv', tech: 'tech1',
    title: 'Column of dead pixels at C2·R7',
    description: 'A vertical line of dead pixels in the cabinet at C2·R7.',
  },
  {
    key: 'T41', wall: 'w02', cells: [[4, 1]], priority: 'normal', status: 'new', hoursAgo: 20,
    reporter: 'fellowshipMedia',
    title: 'Top-right of the left side wall flickers',
    description: 'The cabinet at the top-right corner (C4·R1) of the left side wall flickers now and then.',
  },
  {
    key: 'T42', wall: 'w01', cells: [[8, 4]], priority: 'normal', status: 'closed', ageDays: 19, hour: 10,
    reporter: 'fellowshipMedia', tech: 'tech1',
    title: 'C8·R4 flickering',
    description: 'The cabinet next to the one you fixed last month, C8·R4, now flickers during services.',
    repairs: [{ column: 8, row: 4, component: 'receiving_card', fault: 'flicker', action: 'replaced', part: 'rxc', fate: 'to_bench', notes: 'Card resetting every few minutes. Replaced. Input voltage at C8·R4 4.6 V under full white: low.' }],
    resolution: 'Replaced the receiving card in C8·R4. We measured a low supply voltage on this part of the wall and have asked your facilities team to have the circuit checked.',
    internal: ['Row 4 again. Low voltage at C7/C8·R4 points at distro B circuit 4, not the cabinets. Raised with facilities.'],
  },
  {
    key: 'T43', wall: 'w12', scope: 'controller', priority: 'low', status: 'acknowledged', ageDays: 2, hour: 11,
    reporter: 'freightAv', tech: 'tech1',
    title: 'Can the lobby wall show a clock?',
    description: 'Could the lobby wall show a small clock in one corner over the brand content?',
    internal: ['The processor can overlay a clock, but the content player does it better: check with their content agency.'],
  },
];

export interface MaintenanceSpec {
  wall: WallKey;
  intervalMonths: number;
  /** When it was last done; the builder adds a completed visit when this is within the demo's history. */
  lastDoneDaysAgo: number;
  tech: 'tech1' | 'tech2';
  summary: string;
  /** Work found during the visit. */
  repairs?: RepairSpec[];
}

export const maintenanceSpecs: MaintenanceSpec[] = [
  { wall: 'w01', intervalMonths: 6, lastDoneDaysAgo: 178, tech: 'tech1', summary: 'Cleaned, checked all connectors and fans, no dead modules. Processor configuration backed up.' },
  { wall: 'w02', intervalMonths: 6, lastDoneDaysAgo: 100, tech: 'tech1', summary: 'Cleaned and checked the flying hardware with the church\'s rigger. No faults.' },
  { wall: 'w04', intervalMonths: 12, lastDoneDaysAgo: 300, tech: 'tech1', summary: 'Annual check: cleaned, connectors checked, firmware current.' },
  { wall: 'w05', intervalMonths: 6, lastDoneDaysAgo: 172, tech: 'tech2', summary: 'Cleaned the surface (fingerprints and dust). All modules lit.' },
  { wall: 'w06', intervalMonths: 6, lastDoneDaysAgo: 195, tech: 'tech2', summary: 'Cleaned, checked connectors; two loose data latches secured.' },
  { wall: 'w07', intervalMonths: 12, lastDoneDaysAgo: 40, tech: 'tech2', summary: 'Annual check done after school. No faults found.' },
  { wall: 'w09', intervalMonths: 3, lastDoneDaysAgo: 85, tech: 'tech2', summary: 'Flown in with the venue crew, cleaned, all cabinets checked. No faults.' },
  {
    wall: 'w10', intervalMonths: 3, lastDoneDaysAgo: 80, tech: 'tech2',
    summary: 'Cleaned the face and the air paths, checked seals and cable glands. One clogged fan cleaned.',
    repairs: [{ column: 2, row: 3, component: 'fan', fault: 'other', action: 'cleaned', notes: 'Fan intake clogged with dust and insects; cleaned. Running at normal speed.' }],
  },
  { wall: 'w11', intervalMonths: 6, lastDoneDaysAgo: 120, tech: 'tech2', summary: 'Checked curve locks and alignment after the trade-show season; cleaned.' },
  { wall: 'w12', intervalMonths: 6, lastDoneDaysAgo: 173, tech: 'tech1', summary: 'Cleaned before opening hours; all modules lit, calibration file verified.' },
];
