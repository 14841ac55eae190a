import { Router } from 'express';
import { CHECKLIST_PHASES } from '../../shared/domain/checklist';
import { createTemplateSchema, templateParams, updateTemplateSchema } from '../../shared/schemas/checks';
import { authOf } from '../auth/require-auth';
import { createTemplate } from '../commands/create-template';
import { updateTemplate } from '../commands/update-template';
import { ChecklistTemplate } from '../models';
import { authorize } from '../policies/authorize';
import { presentTemplate, presentTemplates } from '../presenters/checklist';

/** The team's checklist templates: mounted at /api/checklist-templates. */
export function checklistTemplatesRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const templates = await ChecklistTemplate.findAll({ where: { teamId: auth.membership.teamId }, order: [['name', 'ASC'], ['id', 'ASC']] });
    // Phases in the order a weekend runs them, not alphabetically.
    const byPhase = templates.sort((a, b) => CHECKLIST_PHASES.indexOf(a.phase) - CHECKLIST_PHASES.indexOf(b.phase));
    res.json(await presentTemplates(byPhase));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'templates:edit');
    const input = createTemplateSchema.parse(req.body);
    const { template, created } = await createTemplate(auth.membership.teamId, auth.user.id, input);
    res.status(created ? 201 : 200).json(template);
  });

  router.get('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { id } = templateParams.parse(req.params);
    res.json(await presentTemplate(await ChecklistTemplate.ofTeam(auth.membership.teamId, id)));
  });

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'templates:edit');
    const { id } = templateParams.parse(req.params);
    const input = updateTemplateSchema.parse(req.body);
    res.json(await updateTemplate(auth.membership.teamId, auth.user.id, id, input));
  });

  return router;
}
