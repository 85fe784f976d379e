// RF checks page and its settings; the filter's SPICE netlist download.
import { Hono } from 'hono';
import { z } from 'zod';
import type { Project } from '../../core/model';
import { evaluateCached as evaluate } from '../cache/reports';
import { loadProject } from '../../db/projects';
import { num, pct, choice, checkbox } from '../form';
import { projectEdit, doneNotice } from '../edit';
import { sendPage } from '../render';
import type { Deps } from '../deps';
import { Layout } from '../../../views/layout';
import { RfBody, rfSettingsValues } from '../../../views/pages/rf';
import type { Failed } from '../../../views/components/failed';

const rfSettingsSchema = z.object({
  spuriousRule: choice('Spurious-emission rule', ['us-97-307', 'itu-app3']),
  evenHarmonic: num('dB', { label: '2nd-harmonic residual', min: -120, max: 0 }),
  worstSwr: num('', { label: 'Worst-case SWR', min: 1, max: 100 }),
  antennaGain: num('dB', { label: 'Antenna gain', min: -30, max: 30 }),
  feedlineLoss: num('dB', { label: 'Feedline loss', min: 0, max: 100 }),
  groundReflection: checkbox,
  dutyFactor: pct({ label: 'Mode duty factor', min: 0, max: 100 }),
  onFraction: pct({ label: 'Share of the averaging time on the air', min: 0, max: 100 }),
});

const body = (p: Project, failed?: Failed, notice?: string) => <RfBody project={p} report={evaluate(p)} failed={failed} notice={notice} />;
const page = (p: Project, failed?: Failed, notice?: string) => (
  <Layout title={`RF checks · ${p.name}`} project={p} section="rf">
    {body(p, failed, notice)}
  </Layout>
);

export function rfRoutes(deps: Deps) {
  const app = new Hono();
  app.get('/projects/:id/rf', async (c) => {
    const p = await loadProject(deps.database.db, c.req.param('id'));
    if (!p) return c.notFound();
    return sendPage(c, page(p, undefined, doneNotice(c)));
  });
  app.post(
    '/projects/:id/rf/settings',
    projectEdit(deps, {
      form: 'rf-settings',
      schema: rfSettingsSchema,
      values: rfSettingsValues,
      change: (p, d) => ({
        ...p,
        rf: {
          spuriousRule: d.spuriousRule,
          evenHarmonicDbc: d.evenHarmonic,
          worstSwr: d.worstSwr,
          antennaGainDbi: d.antennaGain,
          feedlineLossDb: d.feedlineLoss,
          groundReflection: d.groundReflection,
          exposureDutyFactor: d.dutyFactor,
          exposureOnFraction: d.onFraction,
        },
      }),
      redirect: (p) => `/projects/${p.id}/rf`,
      partial: body,
      page,
    }),
  );
  return app;
}
