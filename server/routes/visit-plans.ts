// The visit plan of a job, and the kit and timing per camera class the plan draws on.
import { Router } from 'express';
import { param } from 'express-validator';

import type { CameraClass } from '../../shared/capture-record';
import type { VisitPlan } from '../../shared/visit-plan';
import { requireBaseVersion } from '../middleware/base-version';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { getPlan, listCameraClassSettings, savePlan, updateCameraClassSettings } from '../services/visit-plan-service';
import { cameraClassParam, cameraClassSettingsRules, visitPlanRules } from '../validators/visit-plan';

export const visitPlansRouter = Router();

const jobId = param('id', 'Must be a job id').isInt({ min: 1 }).toInt();
const anyone = requireRole('technician', 'reviewer', 'manager', 'admin');

visitPlansRouter.get('/jobs/:id/plan', anyone, validate(jobId), async (req, res) => {
  res.json(await getPlan(req.user!, Number(req.params.id)));
});

visitPlansRouter.put(
  '/jobs/:id/plan',
  requireRole('technician'),
  requireBaseVersion,
  validate(jobId, ...visitPlanRules),
  async (req, res) => {
    res.json(await savePlan(req.user!, Number(req.params.id), req.body as VisitPlan, req.baseVersion!));
  },
);

visitPlansRouter.get('/camera-classes', anyone, async (_req, res) => {
  res.json({ cameraClasses: await listCameraClassSettings() });
});

visitPlansRouter.put(
  '/camera-classes/:cameraClass',
  requireRole('manager'),
  requireBaseVersion,
  validate(cameraClassParam, ...cameraClassSettingsRules),
  async (req, res) => {
    const { kitItems, minutesPerStation, setupMinutes } = req.body;
    res.json({
      settings: await updateCameraClassSettings(
        req.user!,
        req.params.cameraClass as CameraClass,
        { kitItems, minutesPerStation, setupMinutes },
        req.baseVersion!,
      ),
    });
  },
);
