/** Every seed, in order; applied ones are recorded in the `seeder_meta` table. */
import type { Sequelize } from 'sequelize';
import type { Step } from '../umzug';
import * as demoScenario from './2026.12.01T11.00.00.demo-scenario';
import * as demoRuns from './2026.12.02T09.00.00.demo-runs';

export const seeds: Step<Sequelize>[] = [
  { name: '2026.12.01T11.00.00.demo-scenario', ...demoScenario },
  { name: '2026.12.02T09.00.00.demo-runs', ...demoRuns },
];
