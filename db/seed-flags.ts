import { ENGINE_VERSION, solveDrain, solveSiphon } from '../src/lib/hydraulics';
import type { DrainRequest, SiphonRequest } from '../src/lib/hydraulics/types';
import type { Db } from '../src/lib/db/client';
import { hashToken, newViewToken } from '../src/lib/flags/ids';
import { flagMessages, flagSnapshots, flags } from './schema';

// Invented flags for the invented demo firm (see db/seed.ts): one from a crew member, one from a
// signed-out visitor, so the support desk has work to show. Fixed ids keep the seed idempotent.
// Ages count back from seeding time, so a fresh demo desk shows a day-old and a fresh flag.

const tankWall: SiphonRequest = {
  fluid: { water_temperature_c: 18 },
  site: { altitude_m: 240 },
  line: { inner_diameter_m: 0.01905, length_m: 14, material: 'garden-hose' },
  source_level_m: 1.2,
  outlet_elevation_m: -0.6,
  crest_elevation_m: 2.4,
  length_to_crest_m: 3,
};

const gardenPond: DrainRequest = {
  fluid: { water_temperature_c: 14 },
  vessel: {
    shape: 'sloped_pond',
    bottom_length_m: 3,
    bottom_width_m: 2,
    side_slope_h_per_v: 1.5,
    depth_m: 0.9,
  },
  initial_depth_m: 0.8,
  final_depth_m: 0.05,
  outlet: { type: 'orifice', diameter_m: 0.05 },
};

interface DemoFlag {
  id: string;
  flag: Omit<typeof flags.$inferInsert, 'id' | 'viewTokenHash' | 'createdAt' | 'updatedAt'>;
  snapshot: { inputs: object; results: object; page: string };
  hoursAgo: number;
}

function demoFlags(): DemoFlag[] {
  return [
    {
      id: 'flg_demo_tank_wall',
      flag: {
        tool: 'siphon',
        reason: 'site_differs',
        message:
          'Ran for a couple of minutes, then gurgled and stopped. Crest was the tank lip, about 1.2 m above the water.',
        reporterUserId: 'usr_demo_crew1',
        reporterEmail: 'tomas@heronsgate.example',
        organisationId: 'org_demo_heronsgate',
        status: 'new',
      },
      snapshot: { inputs: tankWall, results: solveSiphon(tankWall), page: '/siphon' },
      hoursAgo: 26,
    },
    {
      id: 'flg_demo_garden_pond',
      flag: {
        tool: 'drain',
        reason: 'need_help',
        message:
          'Not sure what to type for the side slope of a pond with stepped planting shelves.',
        reporterEmail: 'marta@cobblepath.example',
        status: 'in_hand',
        assigneeUserId: 'usr_demo_support',
      },
      snapshot: { inputs: gardenPond, results: solveDrain(gardenPond), page: '/drain' },
      hoursAgo: 5,
    },
  ];
}

/** Insert the demo flags (after seedDemo, which makes the users they name); idempotent. */
export function seedFlags(db: Db): void {
  db.transaction((tx) => {
    for (const d of demoFlags()) {
      const at = new Date(Date.now() - d.hoursAgo * 3_600_000);
      tx.insert(flags)
        .values({
          ...d.flag,
          id: d.id,
          viewTokenHash: hashToken(newViewToken()),
          createdAt: at,
          updatedAt: at,
        })
        .onConflictDoNothing()
        .run();
      tx.insert(flagSnapshots)
        .values({
          flagId: d.id,
          ...d.snapshot,
          engineVersion: ENGINE_VERSION,
          unitSystem: 'metric',
          createdAt: at,
        })
        .onConflictDoNothing()
        .run();
    }
    tx.insert(flagMessages)
      .values({
        id: 'fmsg_demo_garden_pond_note',
        flagId: 'flg_demo_garden_pond',
        kind: 'note',
        authorUserId: 'usr_demo_support',
        body: 'Suggest a stage table from the shelf depths instead of one slope; ask for rough shelf widths.',
        createdAt: new Date(Date.now() - 4 * 3_600_000),
      })
      .onConflictDoNothing()
      .run();
  });
}
