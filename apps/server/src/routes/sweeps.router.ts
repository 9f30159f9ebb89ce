import { Router } from 'express';
import type { AppContext } from '../app';

/** Placeholder: this part of the API has not landed yet. */
export function sweepsRouter(_ctx: AppContext): Router {
  return Router();
}
