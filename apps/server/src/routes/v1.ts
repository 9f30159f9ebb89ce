import type { Router } from 'express';
import type { AppContext } from '../app';
import { atlasRouter } from './atlas.router';
import { authRouter } from './auth.router';
import { devMailRouter } from './dev-mail.router';
import { graphsRouter } from './graphs.router';
import { keysRouter } from './keys.router';
import { openapiRouter } from './openapi.router';
import { quickRouter } from './quick.router';
import { runPlanRouter } from './run-plan.router';
import { runsRouter } from './runs.router';
import { sharedRouter } from './shared.router';
import { sweepsRouter } from './sweeps.router';
import { usersRouter } from './users.router';
import { verifyRouter } from './verify.router';

/** Every router of the versioned API, mounted at /api/v1. Each file owns its paths. */
export function v1Routers(ctx: AppContext): Router[] {
  return [
    openapiRouter(ctx),
    authRouter(ctx),
    usersRouter(ctx),
    keysRouter(ctx),
    graphsRouter(ctx),
    verifyRouter(ctx),
    runPlanRouter(ctx),
    runsRouter(ctx),
    sweepsRouter(ctx),
    atlasRouter(ctx),
    sharedRouter(ctx),
    quickRouter(ctx),
    devMailRouter(ctx),
  ];
}
