import { Router } from 'express';
import type { Knex } from 'knex';
import { requireRole, requireUser } from '../middleware/require-auth';
import { CatalogueEntryParams, CatalogueSearchQuery, CreateCatalogueEntryBody, UpdateCatalogueEntryBody } from './catalogue.schemas';
import * as service from './catalogue.service';

/** Mounted at /api/catalogue: everyone signed in reads and searches; curators write. */
export function catalogueRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);

  router.get('/', async (req, res) => {
    res.json(await service.listEntries(db, CatalogueSearchQuery.parse(req.query)));
  });

  router.post('/', requireRole('curator'), async (req, res) => {
    res.status(201).json(await service.createEntry(db, req.user!, CreateCatalogueEntryBody.parse(req.body)));
  });

  router.get('/:id', async (req, res) => {
    res.json(await service.getEntry(db, CatalogueEntryParams.parse(req.params).id));
  });

  router.patch('/:id', requireRole('curator'), async (req, res) => {
    const { id } = CatalogueEntryParams.parse(req.params);
    res.json(await service.updateEntry(db, req.user!, id, UpdateCatalogueEntryBody.parse(req.body)));
  });

  router.get('/:id/depiction.svg', async (req, res) => {
    const svg = await service.depiction(db, CatalogueEntryParams.parse(req.params).id);
    res.type('image/svg+xml').set('X-Content-Type-Options', 'nosniff').send(svg);
  });

  return router;
}
