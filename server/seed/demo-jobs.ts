import type { DataSource } from 'typeorm';
import { runCreateSchema, jobCreateSchema, type RunCreateInput } from '../../shared/schemas/jobs';
import { CatalogueStore } from '../catalogue/catalogue.repository';
import { CatalogueService } from '../catalogue/catalogue.service';
import { FlexPartsRepository } from '../flex-parts/flex-parts.repository';
import { FlexPartsService } from '../flex-parts/flex-parts.service';
import { JobsStore } from '../jobs/jobs.repository';
import { JobsService } from '../jobs/jobs.service';
import { RunResults } from '../jobs/run-results';
import { ShopSettingsService } from '../settings/shop-settings.service';
import { UsersRepository } from '../users/users.repository';
import { toPublicUser } from '../users/users.service';

/** Common exhaust tube: OD in inches × 16 ga (0.065 in) wall, in mm. */
const TUBE_63 = { odMm: 63.5, wallMm: 1.651 };
const TUBE_76 = { odMm: 76.2, wallMm: 1.651 };
/** 6 in × 14 ga (0.083 in) for the dryer's hot-air duct. */
const TUBE_152 = { odMm: 152.4, wallMm: 2.108 };

type DemoRun = Omit<RunCreateInput, 'alloyId' | 'installTempC' | 'joint' | 'notes' | 'supports' | 'nearby' | 'startFlangeAlloyId' | 'endFlangeAlloyId'> & {
  /** What the end flanges are made of, by UNS; absent = the run's own alloy. */
  startFlangeUns?: string;
  endFlangeUns?: string;
  supports?: RunCreateInput['supports'];
  nearby?: RunCreateInput['nearby'];
  uns: string;
  joint?: RunCreateInput['joint'];
  notes?: string;
};

interface DemoJob {
  name: string;
  customer: string;
  application: string;
  notes: string;
  runs: DemoRun[];
}

/**
 * The invented shop's three jobs. Wall temperatures sit below the gas: pre-turbine gas 900–1050 °C,
 * downpipe wall ~700–850 °C, tailpipe a few hundred, installed at 20 °C.
 */
export const DEMO_JOBS: DemoJob[] = [
  {
    name: 'Hill-climb special: turbo exhaust',
    customer: 'Fellmoor Hill-Climb Works',
    application: 'Turbo exhaust for a home-built hill-climb car, 2.0 L turbocharged four',
    notes: 'Invented demo job. Customer wants the collector in nickel alloy; rest of the system stainless.',
    runs: [
      {
        name: 'Manifold collector',
        uns: 'N06625',
        tube: TUBE_63,
        segments: [
          { lengthMm: 180, startTempC: 900, endTempC: 890 },
          { lengthMm: 160, startTempC: 890, endTempC: 870 },
        ],
        startFixing: 'manifold_flange',
        endFixing: 'turbo_inlet',
      },
      {
        name: 'Turbo downpipe',
        uns: 'S32100',
        tube: TUBE_76,
        segments: [
          { lengthMm: 250, startTempC: 820, endTempC: 780 },
          { lengthMm: 350, startTempC: 780, endTempC: 700 },
        ],
        startFixing: 'turbo_outlet',
        endFixing: 'v_band',
        startFlangeUns: 'G10200',
        endFlangeUns: 'S30400',
        joint: { type: 'flex', atMm: 300, lateralOffsetMm: 1.5, heatCycles: 5000 },
        supports: [
          { kind: 'sliding', atMm: 180 },
          { kind: 'hanger', atMm: 420 },
        ],
        nearby: [{ kind: 'wiring', label: 'Turbo speed sensor lead', atMm: 120, coldGapMm: 170, direction: 'beside' }],
        notes: 'Flex section 300 mm from the turbo outlet; 1.5 mm of engine rock across it. Support the flex on both sides, never let it carry weight.',
      },
      {
        name: 'Mid-pipe',
        uns: 'S30400',
        tube: TUBE_76,
        segments: [{ lengthMm: 900, startTempC: 640, endTempC: 520 }],
        startFixing: 'v_band',
        endFixing: 'slip_joint',
        supports: [
          { kind: 'hanger', atMm: 400 },
          { kind: 'sliding', atMm: 780 },
        ],
        nearby: [
          { kind: 'fuel_line', label: 'Fuel feed to the rail', atMm: 450, coldGapMm: 170, direction: 'beside' },
          { kind: 'brake_line', label: 'Rear brake line', atMm: 200, coldGapMm: 120, direction: 'beside' },
        ],
        joint: { type: 'slip', inner: { tempC: 520 }, outer: { tempC: 480 }, coldClearanceMm: 0.38, coldEngagementMm: 90, coldAxialGapMm: 25, toleranceMm: 0.03 },
        notes: 'Sleeve expanded on the mandrel to the measured spigot: ±0.03 mm on the sized fit.',
      },
      {
        name: 'Tailpipe',
        uns: 'S40910',
        tube: TUBE_76,
        segments: [{ lengthMm: 1100, startTempC: 420, endTempC: 260 }],
        startFixing: 'slip_joint',
        endFixing: 'free_end',
        supports: [
          { kind: 'sliding', atMm: 120 },
          { kind: 'hanger', atMm: 700 },
        ],
        nearby: [{ kind: 'rubber', label: 'Rear bumper mount', atMm: 1100, coldGapMm: 130, direction: 'in_line' }],
      },
    ],
  },
  {
    name: 'Road car downpipe',
    customer: 'Odile Marchetti-Brandt (private customer)',
    application: 'Replacement downpipe for a road car, 1.6 L turbocharged hatchback',
    notes: 'Invented demo job.',
    runs: [
      {
        name: 'Downpipe, turbo to flex',
        uns: 'S32100',
        tube: TUBE_63,
        segments: [{ lengthMm: 320, startTempC: 780, endTempC: 740 }],
        startFixing: 'turbo_outlet',
        endFixing: 'flex_section',
        startFlangeUns: 'G10200',
        joint: { type: 'flex', atMm: 320 },
        supports: [{ kind: 'hanger', atMm: 250 }],
      },
      {
        name: 'Downpipe, flex to catalyst flange',
        uns: 'S30400',
        tube: TUBE_63,
        segments: [{ lengthMm: 560, startTempC: 740, endTempC: 640 }],
        startFixing: 'flex_section',
        endFixing: 'flange',
        supports: [{ kind: 'sliding', atMm: 100 }],
        nearby: [{ kind: 'wiring', label: 'Oxygen sensor harness', atMm: 300, coldGapMm: 170, direction: 'beside' }],
      },
    ],
  },
  {
    name: 'Dryer hot-air duct',
    customer: 'Brackenridge Grain & Seed Co-operative',
    application: 'Hot-air duct from the burner box to the drying drum of an industrial grain dryer',
    notes: 'Invented demo job. Duct hangs from sliding brackets; one slip joint takes up the growth.',
    runs: [
      {
        name: 'Burner box to slip joint',
        uns: 'S30400',
        tube: TUBE_152,
        segments: [{ lengthMm: 3000, startTempC: 480, endTempC: 450 }],
        startFixing: 'equipment_nozzle',
        endFixing: 'slip_joint',
        startFlangeUns: 'G10200',
        supports: [
          { kind: 'hanger', atMm: 1000 },
          { kind: 'hanger', atMm: 2000 },
          { kind: 'sliding', atMm: 2880 },
        ],
        nearby: [{ kind: 'panel', label: 'Dryer casing', atMm: 1500, coldGapMm: 40, direction: 'beside' }],
        joint: {
          type: 'slip',
          inner: { tempC: 450 },
          outer: { tempC: 430 },
          coldClearanceMm: 0.6,
          coldEngagementMm: 160,
          coldAxialGapMm: 40,
          toleranceMm: 0.05,
          maxRadialClearanceMm: 0.5,
        },
        notes: 'Rolled sleeve sized to the duct (±0.05 mm). A low-pressure air duct takes a looser fit than an exhaust: up to 0.5 mm radial.',
      },
      {
        name: 'Slip joint to drum inlet',
        uns: 'S30400',
        tube: TUBE_152,
        segments: [{ lengthMm: 2400, startTempC: 450, endTempC: 420 }],
        startFixing: 'slip_joint',
        endFixing: 'equipment_nozzle',
        endFlangeUns: 'G10200',
        supports: [
          { kind: 'sliding', atMm: 120 },
          { kind: 'hanger', atMm: 1200 },
        ],
      },
    ],
  },
];

/** Idempotent: adds the demo jobs whose names are missing, as the demo fabricator. Returns how many were added. */
export async function seedDemoJobs(dataSource: DataSource): Promise<number> {
  const fabricator = await new UsersRepository(dataSource).findByEmail('fabricator@dilato.test');
  if (!fabricator) throw new Error('seed demo users before the demo jobs');
  const catalogueStore = new CatalogueStore(dataSource);
  const catalogue = new CatalogueService(catalogueStore);
  const store = new JobsStore(dataSource);
  const jobs = new JobsService(store, new RunResults(catalogue, new FlexPartsService(new FlexPartsRepository(dataSource)), new ShopSettingsService(dataSource)));

  let added = 0;
  for (const demo of DEMO_JOBS) {
    if (await store.read().findJobByName(demo.name)) continue;
    const idOf = async (uns: string | undefined) => (uns === undefined ? null : ((await catalogueStore.read().findAlloyByUns(uns))?.id ?? undefined));
    const alloyIds = await Promise.all(demo.runs.map((r) => idOf(r.uns)));
    const flangeIds = await Promise.all(demo.runs.map(async (r) => [await idOf(r.startFlangeUns), await idOf(r.endFlangeUns)] as const));
    // Without the reference catalogue (SEED_CATALOGUE=false) the demo alloys are not there to build with.
    if ([...alloyIds, ...flangeIds.flat()].some((id) => id === undefined)) continue;
    const { runs, ...fields } = demo;
    const job = await jobs.createJob(jobCreateSchema.parse(fields), toPublicUser(fabricator));
    for (const [i, { uns: _uns, startFlangeUns: _s, endFlangeUns: _e, ...run }] of runs.entries()) {
      const [startFlangeAlloyId, endFlangeAlloyId] = flangeIds[i];
      await jobs.createRun(job.id, runCreateSchema.parse({ ...run, alloyId: alloyIds[i], startFlangeAlloyId, endFlangeAlloyId }));
    }
    added += 1;
  }
  return added;
}
