import { Router } from 'express';
import type { AppContext } from '../app';

/** Placeholder: this part of the API has not landed yet. */
export function runsRouter(_ctx: AppContext): Router {
  return Router();
}
