import { Router } from 'express';
import { createIncidentSchema, incidentListQuery, incidentParams, updateIncidentSchema, type IncidentListJson } from '../../shared/schemas/incidents';
import { authOf } from '../auth/require-auth';
import { createIncident } from '../commands/create-incident';
import { updateIncident } from '../commands/update-incident';
import { viewOf } from '../incidents/access';
import { csvFileName, incidentsCsv } from '../incidents/csv';
import { incidentLog, zonesOf } from '../incidents/log';
import { Incident } from '../models';
import { authorize } from '../policies/authorize';
import { presentIncident, presentIncidents } from '../presenters/incident';

/** The safety log and its reports: mounted at /api/incidents. `publicUrl` starts the link an alert carries. */
export function incidentsRouter({ publicUrl }: { publicUrl: string }) {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:read');
    const query = incidentListQuery.parse(req.query);
    const { incidents } = await incidentLog(auth.membership.teamId, query);
    const answer: IncidentListJson = { incidents: await presentIncidents(incidents) };
    res.json(answer);
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:report');
    const input = createIncidentSchema.parse(req.body);
    const { incident, created } = await createIncident(auth.membership.teamId, auth.user.id, input, { publicUrl });
    res.status(created ? 201 : 200).json(await presentIncident(incident, viewOf(auth, incident)));
  });

  router.get('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:report');
    const { id } = incidentParams.parse(req.params);
    const incident = await Incident.ofTeam(auth.membership.teamId, id);
    res.json(await presentIncident(incident, viewOf(auth, incident)));
  });

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:manage');
    const { id } = incidentParams.parse(req.params);
    const input = updateIncidentSchema.parse(req.body);
    res.json(await updateIncident(auth.membership.teamId, auth.user.id, id, input, { publicUrl }));
  });

  return router;
}

/** The safety log as a spreadsheet download: mounted at /api/incidents.csv. */
export function incidentsCsvRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:read');
    const query = incidentListQuery.parse(req.query);
    const { incidents, event } = await incidentLog(auth.membership.teamId, query);
    const csv = incidentsCsv(await presentIncidents(incidents), await zonesOf(auth.membership.teamId, incidents));
    res.set({
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="${csvFileName(event?.name ?? null)}"`,
      // People and injuries: never kept by a shared cache, nor by the browser past the download.
      'Cache-Control': 'private, no-store',
    });
    res.send(csv);
  });

  return router;
}
