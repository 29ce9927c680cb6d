import { Router } from 'express';
import type { Knex } from 'knex';
import type { JobQueue } from '../jobs/job-queue';
import { requireUser } from '../middleware/require-auth';
import { streamSimulationEvents } from './simulation-events';
import { SimulationParams, StartSimulationBody } from './simulations.schemas';
import * as service from './simulations.service';
import { resolveSimulationSource } from './simulation-source';

function present(row: Awaited<ReturnType<typeof service.getSimulation>>) {
  const { sourceText: _text, cacheKey: _key, ...rest } = row;
  return rest;
}

export function simulationRoutes(db: Knex, jobs: JobQueue | undefined): Router {
  const router = Router();
  router.use(requireUser);

  router.post('/', async (req, res) => {
    const body = StartSimulationBody.parse(req.body);
    const source = await resolveSimulationSource(db, req.user!, body);
    const started = await service.startSimulation(db, jobs, req.user!, { ...source, inputs: body.inputs });
    res.status(started.cached ? 200 : 202).json(started);
  });

  router.get('/:id', async (req, res) => {
    const { id } = SimulationParams.parse(req.params);
    res.json(present(await service.getSimulation(db, req.user!, id)));
  });

  router.get('/:id/events', async (req, res) => {
    const { id } = SimulationParams.parse(req.params);
    await service.getSimulation(db, req.user!, id);
    streamSimulationEvents(db, id, req, res);
  });

  router.post('/:id/cancel', async (req, res) => {
    const { id } = SimulationParams.parse(req.params);
    res.json(present(await service.cancelSimulation(db, req.user!, id)));
  });

  return router;
}
