import { runCalculator } from '@skyledger/calc';
import {
  roles,
  type ClaimDetail,
  type DatasetDetail,
  type DatasetUploadView,
  type Role,
  type WorkingRerunResponse,
  type WorkingView,
} from '@skyledger/contracts';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Dataset } from '../src/datasets/entities/dataset.entity';
import { Working } from '../src/workings/entities/working.entity';
import { plainNotes } from './support/evidence-files';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

/** A synthetic series (invented for the test): 0.02 K a year plus a fixed wiggle. */
const syntheticCsv = [
  'year,anomaly_k,note',
  ...Array.from({ length: 30 }, (_, i) => {
    const year = 1990 + i;
    return `${year},${(0.02 * i + 0.1 * Math.sin(i)).toFixed(4)},synthetic`;
  }),
].join('\n');

describe('workings: calculators run by the server, datasets, re-runs', () => {
  let t: TestApp;
  const tokens: Partial<Record<Role, string>> = {};
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  let claim: ClaimDetail;
  const workingsPath = () => `/api/claims/${claim.id}/workings`;

  const uploadCsv = (csv: string, name = 'series.csv', role: Role = 'science_editor') =>
    t.http().post('/api/datasets/uploads').set(as(role)).attach('file', Buffer.from(csv), name);

  beforeAll(async () => {
    t = await createTestApp('workings');
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@workings.test`);
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
    claim = (
      await t
        .http()
        .post('/api/claims')
        .set(as('reporter'))
        .send({
          text: 'The planet is warm because of the heat from its core.',
          summary: 'The core, not the greenhouse effect, keeps the planet warm',
          topics: ['geothermal'],
          claimant: { name: 'Councillor Test', kind: 'public_figure' },
        })
    ).body;
  });
  afterAll(() => t.close());

  describe('saving a working', () => {
    it('stores the server’s own result, whatever outputs the body carries', async () => {
      const response = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({
          calculatorId: 'energy-balance',
          inputs: { solarIrradiance: 1361, albedo: 0.3 },
          note: 'Effective temperature of a planet without a greenhouse effect',
          outputs: { effectiveTemperature: { kind: 'number', value: 999, unit: 'K' } },
          steps: [{ text: 'forged', formula: '', result: '' }],
        });
      expect(response.status).toBe(201);
      const working = response.body as WorkingView;
      const expected = runCalculator('energy-balance', { solarIrradiance: 1361, albedo: 0.3 });
      expect(working.outputs).toEqual(JSON.parse(JSON.stringify(expected.outputs)));
      // (1361 × 0.7 / 4 / σ)^¼ with σ = 5.670374419e-8 W m⁻² K⁻⁴ (CODATA 2018) is 254.58 K;
      // textbooks round it to 255 K (e.g. Hartmann, Global Physical Climatology, 2nd ed., ch. 2).
      expect(working.outputs.effectiveTemperature!.value).toBeCloseTo(254.58, 1);
      expect(working.steps.map((step) => step.text)).not.toContain('forged');
      expect(working).toMatchObject({
        calculatorId: 'energy-balance',
        libraryVersion: expected.libraryVersion,
        ranBy: { displayName: 'science-editor' },
        version: 1,
      });
      expect(working.cautions.length).toBeGreaterThan(0);

      const stored = await t.dataSource.getRepository(Working).findOneByOrFail({ id: working.id });
      expect((stored.outputs.effectiveTemperature as { value: number }).value).not.toBe(999);
      const event = await t.dataSource
        .getRepository(AuditEvent)
        .findOneByOrFail({ entityId: working.id });
      expect(event).toMatchObject({ action: 'working.added', claimId: claim.id });
    });

    it('keeps a band when an input is a range', async () => {
      const response = await t
        .http()
        .post(workingsPath())
        .set(as('desk_chief'))
        .send({
          calculatorId: 'energy-balance',
          inputs: { solarIrradiance: 1361, albedo: { low: 0.28, high: 0.32 } },
        });
      expect(response.status).toBe(201);
      const band = (response.body as WorkingView).outputs.effectiveTemperature!.band as {
        p5: number;
        p50: number;
        p95: number;
      };
      expect(band.p5).toBeLessThan(band.p50);
      expect(band.p50).toBeLessThan(band.p95);
      expect((response.body as WorkingView).monteCarlo).toMatchObject({
        rangedInputs: ['albedo'],
      });
    });

    it('refuses inputs the calculator refuses, with the input and its rule, storing nothing', async () => {
      const before = await t.dataSource.getRepository(Working).count();
      const outOfRange = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({ calculatorId: 'energy-balance', inputs: { albedo: 1.4 } });
      expect(outOfRange.status).toBe(422);
      expect(Object.keys(outOfRange.body.fields)).toEqual(['inputs.albedo']);
      expect(outOfRange.body.fields['inputs.albedo']).toMatch(/albedo must be between 0 and 1/);

      const badUnit = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({
          calculatorId: 'energy-balance',
          inputs: { solarIrradiance: { value: 1, unit: 'm' } },
        });
      expect(badUnit.status).toBe(422);
      expect(Object.keys(badUnit.body.fields)).toEqual(['inputs.solarIrradiance']);

      const unknown = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({ calculatorId: 'crystal-ball', inputs: {} });
      expect(unknown.status).toBe(422);
      expect(unknown.body.fields).toEqual({ calculatorId: 'unknownCalculator' });

      const noInputs = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({ calculatorId: 'energy-balance', inputs: 'all of them' });
      expect(noInputs.status).toBe(400);
      expect(Object.keys(noInputs.body.fields)).toEqual(['inputs']);
      expect(await t.dataSource.getRepository(Working).count()).toBe(before);
    });

    it('lets only science editors and desk chiefs run workings on a claim', async () => {
      for (const role of ['reporter', 'copy_desk'] as const) {
        const response = await t
          .http()
          .post(workingsPath())
          .set(as(role))
          .send({ calculatorId: 'energy-balance', inputs: {} });
        expect({ role, status: response.status }).toEqual({ role, status: 403 });
      }
      const missingClaim = await t
        .http()
        .post('/api/claims/3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f/workings')
        .set(as('science_editor'))
        .send({ calculatorId: 'energy-balance', inputs: {} });
      expect(missingClaim.status).toBe(404);
    });

    it('lists a claim’s workings to the whole desk, edits notes with versions, removes', async () => {
      const list = await t.http().get(workingsPath()).set(as('reporter'));
      expect(list.status).toBe(200);
      const [first] = list.body as WorkingView[];
      expect(first!.calculatorId).toBe('energy-balance');

      const edited = await t
        .http()
        .patch(`${workingsPath()}/${first!.id}`)
        .set(as('science_editor'))
        .send({ note: 'Checked against the textbook value', version: 1 });
      expect(edited.status).toBe(200);
      expect(edited.body).toMatchObject({ note: 'Checked against the textbook value', version: 2 });
      const stale = await t
        .http()
        .patch(`${workingsPath()}/${first!.id}`)
        .set(as('science_editor'))
        .send({ note: 'Overwritten', version: 1 });
      expect(stale.status).toBe(409);
      const changedInputs = await t
        .http()
        .patch(`${workingsPath()}/${first!.id}`)
        .set(as('science_editor'))
        .send({ inputs: { albedo: 0.1 }, version: 2 });
      expect(changedInputs.status).toBe(400);

      const extra = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({ calculatorId: 'carbon-units', inputs: {} });
      expect(extra.status).toBe(201);
      const removed = await t
        .http()
        .delete(`${workingsPath()}/${extra.body.id}`)
        .set(as('science_editor'));
      expect(removed.status).toBe(204);
      const after = (await t.http().get(workingsPath()).set(as('reporter'))).body as WorkingView[];
      expect(after.map((working) => working.id)).not.toContain(extra.body.id);
    });
  });

  describe('re-running a working with the library now in use', () => {
    it('says nothing changed when the result is the same', async () => {
      const [first] = (await t.http().get(workingsPath()).set(as('reporter')))
        .body as WorkingView[];
      const response = await t
        .http()
        .post(`${workingsPath()}/${first!.id}/rerun`)
        .set(as('science_editor'))
        .send({ version: first!.version });
      expect(response.status).toBe(200);
      const rerun = response.body as WorkingRerunResponse;
      expect(rerun).toMatchObject({ changed: false, differences: [] });
      expect(rerun.working.checkedAt).not.toBeNull();
    });

    it('shows what changed when the stored result differs, and keeps the new one', async () => {
      const [first] = (await t.http().get(workingsPath()).set(as('reporter')))
        .body as WorkingView[];
      // As if an older library had given another value and version.
      const repository = t.dataSource.getRepository(Working);
      const stored = await repository.findOneByOrFail({ id: first!.id });
      await repository.update(first!.id, {
        libraryVersion: '0.0.1',
        outputs: {
          ...stored.outputs,
          effectiveTemperature: { kind: 'number', value: 250, unit: 'K' },
        },
      });
      const { version } = await repository.findOneByOrFail({ id: first!.id });
      const response = await t
        .http()
        .post(`${workingsPath()}/${first!.id}/rerun`)
        .set(as('science_editor'))
        .send({ version });
      expect(response.status).toBe(200);
      const rerun = response.body as WorkingRerunResponse;
      expect(rerun.changed).toBe(true);
      expect(rerun.previousLibraryVersion).toBe('0.0.1');
      expect(rerun.differences).toEqual([
        {
          output: 'effectiveTemperature',
          before: { kind: 'number', value: 250, unit: 'K' },
          after: expect.objectContaining({ unit: 'K' }),
        },
      ]);
      expect(rerun.working.outputs.effectiveTemperature!.value).toBeCloseTo(254.58, 1);
      const event = await t.dataSource.getRepository(AuditEvent).findOne({
        where: { entityId: first!.id, action: 'working.rerun' },
        order: { at: 'DESC' },
      });
      expect(event?.summary).toMatchObject({ changedOutputs: ['effectiveTemperature'] });

      const stale = await t
        .http()
        .post(`${workingsPath()}/${first!.id}/rerun`)
        .set(as('science_editor'))
        .send({ version });
      expect(stale.status).toBe(409);
    });
  });

  describe('datasets', () => {
    let dataset: DatasetDetail;

    it('imports a CSV in two steps: columns shown, then rows typed', async () => {
      const uploaded = await uploadCsv(syntheticCsv, 'synthetic-anomalies.csv');
      expect(uploaded.status).toBe(201);
      const view = uploaded.body as DatasetUploadView;
      expect(view).toMatchObject({
        columns: ['year', 'anomaly_k', 'note'],
        rowCount: 30,
        attachment: { mediaType: 'text/csv', originalName: 'synthetic-anomalies.csv' },
      });
      expect(view.previewRows[0]).toEqual(['1990', '0.0000', 'synthetic']);

      const created = await t
        .http()
        .post('/api/datasets')
        .set(as('science_editor'))
        .send({
          attachmentId: view.attachment.id,
          name: 'Synthetic anomalies (test)',
          description: 'Synthetic: 0.02 K a year plus a wiggle, made by the test',
          timeColumn: 'year',
          valueColumns: [{ column: 'anomaly_k', unit: 'K', label: 'Anomaly' }],
        });
      expect(created.status).toBe(201);
      dataset = created.body;
      expect(dataset).toMatchObject({
        rowCount: 30,
        timeRange: { from: 1990, to: 2019 },
        columns: [{ key: 'anomaly_k', label: 'Anomaly', unit: 'K' }],
      });
      // 0.02 × 1 + 0.1 × sin(1) = 0.1041 to four places.
      expect(dataset.rows[1]).toEqual([1991, 0.1041]);
      const list = await t.http().get('/api/datasets').set(as('reporter'));
      expect(list.body.map((item: { id: string }) => item.id)).toContain(dataset.id);
    });

    it('refuses a file with a bad row by its line number, importing nothing', async () => {
      const before = await t.dataSource.getRepository(Dataset).count();
      const bad = 'year,anomaly_k\n2000,0.3\n2001,n/a\n2002,0.4\n2003,\n';
      const uploaded = (await uploadCsv(bad, 'bad.csv')).body as DatasetUploadView;
      const created = await t
        .http()
        .post('/api/datasets')
        .set(as('science_editor'))
        .send({
          attachmentId: uploaded.attachment.id,
          name: 'Bad rows',
          description: 'Has a bad row',
          timeColumn: 'year',
          valueColumns: [{ column: 'anomaly_k', unit: 'K' }],
        });
      expect(created.status).toBe(422);
      expect(created.body.fields).toEqual({
        'line 3: anomaly_k': '"n/a" is not a number',
        'line 5: anomaly_k': 'is empty',
      });
      expect(created.body.message).toContain('line 3, anomaly_k: "n/a" is not a number');
      expect(await t.dataSource.getRepository(Dataset).count()).toBe(before);
    });

    it('refuses what is not a CSV, and strangers to research', async () => {
      const text = await t
        .http()
        .post('/api/datasets/uploads')
        .set(as('science_editor'))
        .attach('file', plainNotes, 'notes.txt');
      expect(text.status).toBe(415);
      expect(text.body.fields).toEqual({ file: 'unsupportedType' });
      expect((await uploadCsv(syntheticCsv, 'x.csv', 'reporter')).status).toBe(403);
      const missing = await t
        .http()
        .get('/api/datasets/3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f')
        .set(as('reporter'));
      expect(missing.status).toBe(404);
    });

    it('feeds a trend working from a dataset column, keeping where the series came from', async () => {
      const response = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({
          calculatorId: 'trend',
          inputs: { series: { dataset: dataset.id, column: 'anomaly_k' }, seriesUnit: 'K' },
        });
      expect(response.status).toBe(201);
      const working = response.body as WorkingView;
      expect(working.datasetRefs).toEqual({
        series: [{ dataset: dataset.id, column: 'anomaly_k' }],
      });
      const expected = runCalculator('trend', {
        series: dataset.rows.map(([t0, y]) => ({ t: t0!, y: y! })),
        seriesUnit: 'K',
      });
      expect(working.outputs.slopePerDecade!.value).toBeCloseTo(
        expected.outputs.slopePerDecade.value,
        10,
      );

      const wrongColumn = await t
        .http()
        .post(workingsPath())
        .set(as('science_editor'))
        .send({
          calculatorId: 'trend',
          inputs: { series: { dataset: dataset.id, column: 'nope' } },
        });
      expect(wrongColumn.status).toBe(422);
      expect(wrongColumn.body.fields).toEqual({ 'inputs.series': 'unknownColumn' });
    });
  });

  describe('the calculator library, open to anyone', () => {
    it('lists the calculators and runs one without saving, with no sign-in', async () => {
      const list = await t.http().get('/api/calculators');
      expect(list.status).toBe(200);
      expect(list.body.calculators.map((c: { id: string }) => c.id)).toContain('layer-atmosphere');
      const before = await t.dataSource.getRepository(Working).count();
      const run = await t
        .http()
        .post('/api/calculators/energy-balance/run')
        .send({ inputs: { albedo: 0.3 } });
      expect(run.status).toBe(200);
      expect(run.body.outputs.effectiveTemperature.value).toBeCloseTo(254.58, 1);
      expect(await t.dataSource.getRepository(Working).count()).toBe(before);
    });

    it('refuses bad inputs with 422 and datasets, which are the desk’s', async () => {
      const bad = await t
        .http()
        .post('/api/calculators/energy-balance/run')
        .send({ inputs: { albedo: -1 } });
      expect(bad.status).toBe(422);
      expect(Object.keys(bad.body.fields)).toEqual(['inputs.albedo']);
      const withDataset = await t
        .http()
        .post('/api/calculators/trend/run')
        .send({
          inputs: { series: { dataset: '3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f', column: 'x' } },
        });
      expect(withDataset.status).toBe(422);
      expect(withDataset.body.fields).toEqual({ 'inputs.series': 'datasetNotAllowed' });
    });
  });
});
