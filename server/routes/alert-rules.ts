import { Router } from 'express';
import { alertRuleParams, alertRuleSchema, type AlertRulesJson } from '../../shared/schemas/mail';
import { authOf } from '../auth/require-auth';
import { updateAlertRule } from '../commands/update-alert-rule';
import { alertRulesOf } from '../incidents/alert-rules';
import { authorize } from '../policies/authorize';

/** Whom incident alerts reach (the defaults until changed): mounted at /api/team/alert-rules. */
export function alertRulesRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'alerts:manage');
    const answer: AlertRulesJson = { rules: await alertRulesOf(auth.membership.teamId) };
    res.json(answer);
  });

  router.put('/:key', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'alerts:manage');
    const { key } = alertRuleParams.parse(req.params);
    const input = alertRuleSchema.parse(req.body);
    res.json(await updateAlertRule(auth.membership.teamId, key, input));
  });

  return router;
}
