import { seedDemoLine2Drying, seedDemoWeldCellHeats } from './demo-beyond-onset';
import { seedDemoChecks } from './demo-checks';
import { seedDemoFluids } from './demo-fluids';
import { seedDemoReadings } from './demo-readings';
import { seedDemoSheets } from './demo-sheets';
import { seedDemoUsers } from './demo-users';
import type { SeedStep } from './seed-step';

/**
 * The demo scenario, in dependency order. A feature that brings demo data adds its own
 * file next to this one (e.g. demo-fluids.ts exporting seedDemoFluids) and one line here.
 */
export const demoSeedSteps: SeedStep[] = [seedDemoUsers, seedDemoFluids, seedDemoLine2Drying, seedDemoWeldCellHeats, seedDemoChecks, seedDemoSheets, seedDemoReadings];
