import { Router } from 'express';
import type { Knex } from 'knex';
import { requireRole, requireUser } from '../middleware/require-auth';
import { MechanismParams } from '../revisions/revisions.schemas';
import * as remarks from './remarks.service';
import { AssignReviewerBody, OpenRoundBody, RemarkBody, RoundParams, VerdictBody } from './reviews.schemas';
import * as rounds from './rounds.service';
import { giveVerdict } from './verdicts.service';

export interface ReviewSettings {
  /** Endorsements a round needs before a curator can adopt it. */
  endorsementsNeeded: number;
}

/** Mounted at /api/mechanisms: a mechanism's review rounds. */
export function mechanismRoundsRoutes(db: Knex, settings: ReviewSettings): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/:slug/rounds', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    res.json(await rounds.listRounds(db, req.user!, slug));
  });
  router.post('/:slug/rounds', async (req, res) => {
    const { slug } = MechanismParams.parse(req.params);
    const { revision } = OpenRoundBody.parse(req.body);
    res.status(201).json(await rounds.openRound(db, req.user!, slug, revision, settings.endorsementsNeeded));
  });
  return router;
}

/** Mounted at /api/rounds: one round, its reviewers, verdicts, remarks and closing acts. */
export function roundsRoutes(db: Knex): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/:id', async (req, res) => {
    res.json(await rounds.getRound(db, req.user!, RoundParams.parse(req.params).id));
  });
  router.post('/:id/reviewers', requireRole('curator'), async (req, res) => {
    const { id } = RoundParams.parse(req.params);
    res.json(await rounds.assignReviewer(db, req.user!, id, AssignReviewerBody.parse(req.body).userId));
  });
  router.post('/:id/verdicts', async (req, res) => {
    const { id } = RoundParams.parse(req.params);
    res.json(await giveVerdict(db, req.user!, id, VerdictBody.parse(req.body)));
  });
  router.post('/:id/withdraw', async (req, res) => {
    res.json(await rounds.withdrawRound(db, req.user!, RoundParams.parse(req.params).id));
  });
  router.post('/:id/adopt', requireRole('curator'), async (req, res) => {
    res.json(await rounds.adoptRound(db, req.user!, RoundParams.parse(req.params).id));
  });
  router.get('/:id/remarks', async (req, res) => {
    res.json(await remarks.listRemarks(db, req.user!, RoundParams.parse(req.params).id));
  });
  router.post('/:id/remarks', async (req, res) => {
    const { id } = RoundParams.parse(req.params);
    res.status(201).json(await remarks.addRemark(db, req.user!, id, RemarkBody.parse(req.body)));
  });
  return router;
}
