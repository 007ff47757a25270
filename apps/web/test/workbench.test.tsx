import type * as Calc from '@skyledger/calc';
import type { Role, WorkingView } from '@skyledger/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { apiError, mockApi, type Routes } from './api-mock';
import { coreClaim, coreClaimId, queueItems, queueOf } from './claim-fixtures';
import { stationDataset, stationDatasetId } from './dataset-fixtures';
import { deskPeople, sessionFor } from './fixtures';
import { renderApp } from './render-app';

function sessionRoutes(role: Role): Routes {
  return { 'POST /api/auth/refresh': { status: 200, body: sessionFor(role) } };
}

const claimRoute: Routes = {
  [`GET /api/claims/${coreClaimId}`]: { status: 200, body: coreClaim },
};

// A SYNTHETIC station series long enough for a trend: 0.02 K a year with an alternating wiggle.
const longStation = {
  ...stationDataset,
  rowCount: 30,
  timeRange: { from: 1990, to: 2019 },
  rows: Array.from({ length: 30 }, (_, index) => [
    1990 + index,
    Number((0.02 * index + (index % 2 === 0 ? 0.05 : -0.05)).toFixed(3)),
  ]),
};
const { rows: _rows, ...longStationSummary } = longStation;

function outputsTable() {
  return screen.findByRole('table', { name: 'Outputs' });
}

/** The output row of the table whose header cell is `label`. */
async function outputRow(label: string) {
  const table = await outputsTable();
  const header = within(table).getByRole('rowheader', { name: new RegExp(`^${label}`) });
  return header.closest('tr') as HTMLElement;
}

describe('workbench', { timeout: 20_000 }, () => {
  // Under Vitest the library's entry loads mathjs from source: load it once up front.
  let calc: typeof Calc;
  beforeAll(async () => {
    calc = await import('@skyledger/calc');
  });

  it('lists every calculator and carries the claim to save to into each', async () => {
    mockApi(sessionRoutes('reporter'));
    renderApp(`/workbench?claim=${coreClaimId}`);

    // The first test pays for loading the workbench's route module on a busy machine.
    await screen.findByRole('heading', { level: 1, name: 'Workbench' }, { timeout: 15_000 });
    for (const calculator of calc.calculators) {
      expect(screen.getByRole('link', { name: calculator.title })).toHaveAttribute(
        'href',
        `/workbench/${calculator.id}?claim=${coreClaimId}`,
      );
      expect(screen.getByText(calculator.summary)).toBeInTheDocument();
    }
  });

  it('answers an address that names no calculator with a page not found', async () => {
    mockApi(sessionRoutes('reporter'));
    renderApp('/workbench/perpetual-motion');
    expect(
      await screen.findByRole('heading', { name: 'Page not found' }, { timeout: 15_000 }),
    ).toBeInTheDocument();
  });

  it('shows the library’s rule on an out-of-range albedo, on that field only', async () => {
    mockApi(sessionRoutes('reporter'));
    const { user } = renderApp('/workbench/energy-balance');

    const albedo = await screen.findByRole('textbox', { name: 'Bond albedo α' });
    // The default and its published source are shown beside the field.
    expect(albedo).toHaveAccessibleDescription(/Default 0\.29 \(source: Stephens 2015\)/);
    expect(albedo).toHaveAccessibleDescription(/Allowed: from 0 to 1\./);
    await user.clear(albedo);
    await user.type(albedo, '1.5');

    await waitFor(() =>
      expect(albedo).toHaveAccessibleDescription(/albedo must be between 0 and 1/),
    );
    expect(albedo).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('textbox', { name: 'Total solar irradiance S' })).not.toHaveAttribute(
      'aria-invalid',
    );
    expect(screen.queryByRole('table', { name: 'Outputs' })).not.toBeInTheDocument();
    expect(screen.getByRole('status')).toHaveTextContent(
      'No result for these inputs. Bond albedo α: albedo must be between 0 and 1',
    );

    await user.clear(albedo);
    await user.type(albedo, '0.3');
    // Tₑ = (S (1 − α) / (4 σ))^¼ with S = 1360.8 W/m² (Kopp & Lean 2011), α = 0.3 and
    // σ = 5.670374419e−8 W/m²/K⁴ (CODATA 2018): 254.57 K, the textbook 255 K.
    await waitFor(async () =>
      expect(await outputRow('Effective temperature')).toHaveTextContent('254.6 K'),
    );
    expect(albedo).not.toHaveAttribute('aria-invalid');
  });

  it('keeps a value’s meaning when its unit is switched', async () => {
    mockApi(sessionRoutes('reporter'));
    const { user } = renderApp('/workbench/energy-balance');

    const irradiance = await screen.findByRole('textbox', { name: 'Total solar irradiance S' });
    // F = S (1 − α) / 4 = 1360.8 × 0.71 / 4 = 241.54 W/m² with the defaults (Kopp & Lean
    // 2011, Stephens et al. 2015), Tₑ = (F/σ)^¼ = 255.47 K.
    expect(await outputRow('Absorbed sunlight')).toHaveTextContent('241.5 W/m²');
    await user.click(screen.getByRole('combobox', { name: 'Unit of Total solar irradiance S' }));
    await user.click(await screen.findByRole('option', { name: 'kW/m²' }));

    expect(irradiance).toHaveValue('1.3608');
    expect(await outputRow('Absorbed sunlight')).toHaveTextContent('241.5 W/m²');
    expect(await outputRow('Effective temperature')).toHaveTextContent('255.5 K');

    await user.clear(irradiance);
    await user.type(irradiance, '1.4');
    // 1.4 kW/m² = 1400 W/m²: F = 1400 × 0.71 / 4 = 248.5 W/m².
    await waitFor(async () =>
      expect(await outputRow('Absorbed sunlight')).toHaveTextContent('248.5 W/m²'),
    );
  });

  it('converts temperatures with their offset: 15 °C is 288.15 K', async () => {
    mockApi(sessionRoutes('reporter'));
    const { user } = renderApp('/workbench/layer-atmosphere');

    const target = await screen.findByRole('textbox', { name: 'Target surface temperature' });
    await user.click(screen.getByRole('combobox', { name: 'Unit of Target surface temperature' }));
    await user.click(await screen.findByRole('option', { name: '°C' }));
    await user.type(target, '15');
    // ε = 2 (1 − (Tₑ/Tₛ)⁴) with Tₑ = 255.47 K and Tₛ = 288.15 K (Archer 2012, ch. 3): 0.7642.
    await waitFor(async () =>
      expect(await outputRow('Emissivity one layer needs')).toHaveTextContent('0.7642'),
    );

    await user.click(screen.getByRole('combobox', { name: 'Unit of Target surface temperature' }));
    await user.click(await screen.findByRole('option', { name: 'K' }));
    expect(target).toHaveValue('288.15');
    expect(await outputRow('Emissivity one layer needs')).toHaveTextContent('0.7642');
  });

  it('turns the outputs into a 5th–50th–95th percentile band, drawn as such, when a range is given', async () => {
    // Recharts measures its box; jsdom has no layout, so give every element a size.
    vi.spyOn(HTMLElement.prototype, 'getBoundingClientRect').mockReturnValue(
      new DOMRect(0, 0, 640, 300),
    );
    vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(640);
    vi.spyOn(HTMLElement.prototype, 'clientHeight', 'get').mockReturnValue(300);
    mockApi(sessionRoutes('reporter'));
    const { user } = renderApp('/workbench/energy-balance');

    await user.click(
      await screen.findByRole('checkbox', { name: /Give a range for Bond albedo α/ }),
    );
    const low = screen.getByRole('textbox', { name: 'Bond albedo α Low' });
    const high = screen.getByRole('textbox', { name: 'Bond albedo α High' });
    expect(low).toHaveValue('0.29');
    await user.clear(low);
    await user.type(low, '0.25');
    await user.clear(high);
    await user.type(high, '0.35');

    const expected = calc.runCalculator('energy-balance', { albedo: { low: 0.25, high: 0.35 } })
      .outputs.effectiveTemperature.band!;
    // The band of the range as typed comes a moment after the typing stops.
    const bandCells = [expected.p5, expected.p50, expected.p95].map((value) =>
      calc.formatQuantity(value, 'K'),
    );
    await waitFor(async () =>
      expect(
        within(await outputRow('Effective temperature'))
          .getAllByRole('cell')
          .map((cell) => cell.textContent),
      ).toEqual(bandCells),
    );
    const table = await outputsTable();
    for (const heading of ['5th percentile', 'Median (50th)', '95th percentile']) {
      expect(within(table).getByRole('columnheader', { name: heading })).toBeInTheDocument();
    }
    // A darker planet is warmer: the 95th percentile belongs to the low albedo end.
    expect(expected.p5).toBeLessThan(expected.p95);
    expect(screen.getByText(/Band from 10,000 Monte Carlo samples/)).toHaveTextContent(
      'over the ranges of Bond albedo α',
    );

    const figure = screen.getByRole('figure', { name: /Energy budget, in and out/ });
    expect(figure).toHaveTextContent(
      /Bars stand at the median; the lines span the 5th to 95th percentile/,
    );
    // The absorbed and the outgoing bars each carry an error bar from p5 to p95.
    await waitFor(() => expect(figure.querySelectorAll('.recharts-errorBar')).toHaveLength(2));
    await user.click(within(figure).getByText('Show the data as a table'));
    const data = within(figure).getByRole('table');
    expect(
      within(data).getByRole('columnheader', { name: '5th percentile (W/m²)' }),
    ).toBeInTheDocument();
  });

  it('saves only the calculator, the inputs and the note, and shows what the server kept', async () => {
    const serverWorking: WorkingView = {
      id: '8c4b2a10-3d5e-4f6a-9b7c-1d0000000001',
      calculatorId: 'layer-atmosphere',
      libraryVersion: '0.1.0',
      inputs: { solarIrradiance: 1360.8, albedo: 0.29, layers: 1, layerEmissivity: 0.8 },
      datasetRefs: null,
      // What the server answered, deliberately apart from the browser's 290.3 K.
      outputs: {
        effectiveTemperature: { kind: 'number', value: 255.47, unit: 'K' },
        surfaceTemperature: { kind: 'number', value: 291.25, unit: 'K' },
      },
      steps: [],
      cautions: [],
      monteCarlo: null,
      note: 'One layer at ε = 0.8.',
      ranBy: {
        id: deskPeople.science_editor.id,
        displayName: deskPeople.science_editor.displayName,
      },
      ranAt: '2026-11-20T10:00:00.000Z',
      checkedAt: '2026-11-20T10:00:00.000Z',
      version: 1,
    };
    const fake = mockApi({
      ...sessionRoutes('science_editor'),
      ...claimRoute,
      [`POST /api/claims/${coreClaimId}/workings`]: { status: 201, body: serverWorking },
    });
    const { user } = renderApp(`/workbench/layer-atmosphere?claim=${coreClaimId}`);

    const panel = await screen.findByRole('region', { name: 'Save to a claim' });
    expect(await within(panel).findByText(coreClaim.summary)).toBeInTheDocument();
    const emissivity = screen.getByRole('textbox', { name: 'Layer emissivity ε' });
    await user.clear(emissivity);
    await user.type(emissivity, '0.8');
    // Tₛ = Tₑ (2 / (2 − ε))^¼ = 255.47 K × (2/1.2)^¼ = 290.27 K for one layer (Archer 2012, ch. 3).
    await waitFor(async () =>
      expect(await outputRow('Surface temperature')).toHaveTextContent('290.3 K'),
    );
    await user.type(
      within(panel).getByRole('textbox', { name: 'Note (optional)' }),
      'One layer at ε = 0.8.',
    );
    await user.click(within(panel).getByRole('button', { name: 'Save the working' }));

    await within(panel).findByText(
      /Saved to “Earth’s core, not greenhouse gases, is warming the planet”/,
    );
    const [request] = fake.calls(`POST /api/claims/${coreClaimId}/workings`);
    expect(request?.body).toEqual({
      calculatorId: 'layer-atmosphere',
      inputs: { layerEmissivity: 0.8 },
      note: 'One layer at ε = 0.8.',
    });
    expect(within(panel).getByRole('link', { name: 'See it on the claim' })).toHaveAttribute(
      'href',
      `/claims/${coreClaimId}#workings`,
    );
    // The server's own figure, not the browser's 290.3 K.
    expect(within(panel).getByText('291.3 K')).toBeInTheDocument();
    expect(within(panel).queryByText('290.3 K')).not.toBeInTheDocument();
  });

  it('reads a series from a dataset, sends the dataset reference, and puts the API’s refusal on that input', async () => {
    const fake = mockApi({
      ...sessionRoutes('desk_chief'),
      ...claimRoute,
      'GET /api/datasets': { status: 200, body: [longStationSummary] },
      [`GET /api/datasets/${stationDatasetId}`]: { status: 200, body: longStation },
      [`POST /api/claims/${coreClaimId}/workings`]: apiError(422, 'No such dataset on the desk', {
        'inputs.series': 'unknownDataset',
      }),
    });
    const { user } = renderApp(`/workbench/trend?claim=${coreClaimId}`);

    expect(
      await screen.findByText(/Choose a dataset and a column, or paste points, for Time series/),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('combobox', { name: 'Dataset' }));
    await user.click(await screen.findByRole('option', { name: longStation.name }));
    // One column: chosen at once, and its unit labels the trend.
    expect(screen.getByRole('combobox', { name: 'Column' })).toHaveTextContent(
      'Station anomaly (K)',
    );
    expect(screen.getByRole('textbox', { name: 'Unit of the values' })).toHaveValue('K');
    // The series rises 0.02 K a year by construction: about 0.2 K a decade (the wiggle tilts it a little).
    const trend = (await outputRow('Trend per decade')).textContent ?? '';
    expect(Number(/([\d.]+) K\/decade/.exec(trend)?.[1])).toBeCloseTo(0.2, 1);

    await user.click(screen.getByRole('button', { name: 'Save the working' }));

    const column = screen.getByRole('combobox', { name: 'Column' });
    await waitFor(() =>
      expect(column).toHaveAccessibleDescription(
        /This dataset is no longer on the desk; choose another/,
      ),
    );
    expect(screen.getByRole('alert')).toHaveTextContent(
      'The server refused these inputs: This dataset is no longer on the desk; choose another.',
    );
    expect(fake.calls(`POST /api/claims/${coreClaimId}/workings`)[0]?.body).toEqual({
      calculatorId: 'trend',
      inputs: { series: { dataset: stationDatasetId, column: 'anomaly_k' }, seriesUnit: 'K' },
    });
  });

  it('lets a desk chief pick the claim from the desk’s claims, a page at a time', async () => {
    const fake = mockApi({
      ...sessionRoutes('desk_chief'),
      ...claimRoute,
      'GET /api/claims': queueOf(queueItems),
    });
    const { user, location } = renderApp('/workbench/ocean-heat');

    const panel = await screen.findByRole('region', { name: 'Save to a claim' });
    const choices = await within(panel).findByRole('radiogroup', { name: 'Claim to save it to' });
    expect(choices).toHaveAccessibleDescription(
      'Every claim on the desk, whatever its state, most recently changed first.',
    );
    expect(fake.calls('GET /api/claims')[0]?.search.toString()).toBe(
      'page=1&pageSize=8&sort=updatedAt&order=desc',
    );
    await user.click(within(choices).getByRole('radio', { name: /Earth’s core, not greenhouse/ }));

    await waitFor(() => expect(location()).toBe(`/workbench/ocean-heat?claim=${coreClaimId}`));
    expect(
      await within(panel).findByRole('button', { name: 'Choose another claim' }),
    ).toBeInTheDocument();
  });

  it('lets reporters and the copy desk run calculators but not save them', async () => {
    for (const role of ['reporter', 'copy_desk'] as const) {
      const fake = mockApi(sessionRoutes(role));
      renderApp(`/workbench/ghg-forcing?claim=${coreClaimId}`);
      // The AR6 defaults give 2.16 W/m² of CO2 forcing (AR6 WG1 Table 7.8).
      expect(await outputRow('CO2 forcing')).toHaveTextContent('2.157 W/m²');
      expect(screen.queryByRole('button', { name: 'Save the working' })).not.toBeInTheDocument();
      expect(screen.queryByRole('region', { name: 'Save to a claim' })).not.toBeInTheDocument();
      expect(fake.requests.map((request) => request.path)).toEqual(['/api/auth/refresh']);
      cleanup();
    }
  });
});
