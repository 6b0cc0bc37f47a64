import type { Router } from 'express';
import type { AppDeps } from '../app.js';
import { healthRouter } from './health.js';

/**
 * Every API router is mounted here, under /api. Each new route must also get its entry in the
 * authorization matrix (tests/integration/authorization-matrix.test.ts).
 */
export function apiRoutesMount(api: Router, deps: AppDeps): void {
  api.use('/health', healthRouter(deps.sequelize));
}
