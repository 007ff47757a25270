import type { Role, WorkingRerunResponse } from '@skyledger/contracts';
import { QueryClient } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { AppProvider } from '@/app/provider';
import { CurrentUserProvider } from '@/features/auth/current-user';
import { ClaimWorkings } from '@/features/workings/components/claim-workings';
import { queryConfig } from '@/lib/query-client';
import { apiError, mockApi, type Routes } from './api-mock';
import { coreClaimId } from './claim-fixtures';
import { datasetList, stationDatasetId } from './dataset-fixtures';
import { deskPeople } from './fixtures';
import { draftVersion, verdictWith } from './verdict-fixtures';
import {
  calculatorCatalogue,
  claimWorkingsPath,
  layerWorking,
  trendWorking,
} from './working-fixtures';

const layerPath = `${claimWorkingsPath}/${layerWorking.id}`;

function workingRoutes(workings = [layerWorking, trendWorking], verdict = verdictWith()): Routes {
  return {
    'GET /api/calculators': { status: 200, body: calculatorCatalogue },
    [`GET ${claimWorkingsPath}`]: { status: 200, body: workings },
    [`GET /api/claims/${coreClaimId}/verdict`]: { status: 200, body: verdict },
    'GET /api/datasets': { status: 200, body: datasetList },
    [`GET /api/claims/${coreClaimId}/history`]: { status: 200, body: [] },
  };
}

/** The workings section alone, as the claim page holds it, for a person of this role. */
function renderWorkings(role: Role) {
  const queryClient = new QueryClient({
    defaultOptions: {
      queries: { ...queryConfig.queries, retry: false },
      mutations: { retry: false },
    },
  });
  const router = createMemoryRouter(
    [
      {
        path: '/claims/:claimId',
        element: (
          <CurrentUserProvider user={deskPeople[role]}>
            <ClaimWorkings claimId={coreClaimId} />
          </CurrentUserProvider>
        ),
      },
    ],
    { initialEntries: [`/claims/${coreClaimId}#workings`] },
  );
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { user: userEvent.setup() };
}

/** A re-run from library 0.1.0 to 0.2.0 that changed the surface temperature. */
function changedRerun(
  rest: Pick<WorkingRerunResponse, 'working' | 'keptBy'>,
): WorkingRerunResponse {
  return {
    ...rest,
    previousLibraryVersion: '0.1.0',
    libraryVersion: '0.2.0',
    changed: true,
    differences: [
      {
        output: 'surfaceTemperature',
        before: layerWorking.outputs.surfaceTemperature!,
        after: { kind: 'number', value: 288.1, unit: 'K' },
      },
    ],
  };
}

async function layerCard() {
  return screen.findByRole('article', { name: 'Layer model of the greenhouse effect' });
}

describe('the workings of a claim', { timeout: 20_000 }, () => {
  it('shows each working with its inputs, outputs, band, steps, cautions and note', async () => {
    mockApi(workingRoutes());
    renderWorkings('copy_desk');

    const card = await layerCard();
    expect(within(card).getByText(/Run by Tobias Renn/)).toHaveTextContent(
      'Library 0.1.0; computed by the server',
    );
    // The run time is shown in the desk's zone, with the zone named.
    expect(within(card).getAllByText((_, node) => node?.tagName === 'TIME')[0]).toHaveAttribute(
      'datetime',
      layerWorking.ranAt,
    );
    const inputs = within(card).getByText('Layer emissivity ε').closest('.rt-DataListItem');
    expect(inputs).toHaveTextContent('0.7 to 0.8 (a uniform range)');
    expect(
      within(card).getByText('Total solar irradiance S').closest('.rt-DataListItem'),
    ).toHaveTextContent('1361 W/m²');

    const surface = within(card).getByText('Surface temperature').closest('.rt-DataListItem');
    expect(surface).toHaveTextContent('287.3 K');
    expect(surface).toHaveTextContent('284.8 to 290 K (5th to 95th percentile), median 287.3 K');
    const layers = within(card)
      .getByText('Layer temperatures, top layer first')
      .closest('.rt-DataListItem');
    expect(layers).toHaveTextContent(
      '241.6 K · 239.5 to 243.8 K (5th to 95th percentile), median 241.6 K',
    );
    expect(card).toHaveTextContent(
      'Bands from 10,000 Monte Carlo samples (seed 20190520) over the range of Layer emissivity ε.',
    );
    expect(within(card).getByText('Limits of this model')).toBeInTheDocument();
    expect(within(card).getByText(layerWorking.cautions[0]!)).toBeInTheDocument();
    expect(within(card).getByText('Absorbed sunlight')).toBeInTheDocument();
    expect(within(card).getByText(layerWorking.note!)).toBeInTheDocument();
    expect(within(card).getByRole('link', { name: 'Open in workbench' })).toHaveAttribute(
      'href',
      `/workbench/layer-atmosphere?claim=${coreClaimId}`,
    );
    // The copy desk reads workings but does not change them.
    expect(within(card).queryByRole('button', { name: /note/ })).not.toBeInTheDocument();
    expect(within(card).queryByRole('button', { name: /Re-run/ })).not.toBeInTheDocument();
    expect(within(card).queryByRole('button', { name: 'Remove' })).not.toBeInTheDocument();

    const trend = screen.getByRole('article', { name: 'Trend with an honest interval' });
    const series = await within(trend).findByRole('link', {
      name: 'SYNTHETIC Marrowby station annual anomalies',
    });
    expect(series).toHaveAttribute('href', `/datasets/${stationDatasetId}`);
    expect(series.closest('.rt-DataListItem')).toHaveTextContent(
      'column “Station anomaly” (anomaly_k) of SYNTHETIC Marrowby station annual anomalies, 5 points, 2014 to 2018',
    );
  });

  it('offers no removal of a working a verdict uses, and says which version', async () => {
    mockApi(
      workingRoutes(
        [layerWorking, trendWorking],
        verdictWith(
          { ...draftVersion, number: 2, embeddedWorkingIds: [trendWorking.id] },
          { ...draftVersion, number: 1, state: 'published', embeddedWorkingIds: [layerWorking.id] },
        ),
      ),
    );
    renderWorkings('science_editor');
    const layer = await layerCard();
    expect(
      await within(layer).findByText('Kept: version 1 of the verdict uses it as it was.'),
    ).toBeInTheDocument();
    expect(within(layer).queryByRole('button', { name: 'Remove' })).not.toBeInTheDocument();
    const trend = screen.getByRole('article', { name: 'Trend with an honest interval' });
    expect(
      within(trend).getByText(
        'In the draft of version 2 of the verdict: take it out there to remove it.',
      ),
    ).toBeInTheDocument();
    expect(within(trend).queryByRole('button', { name: 'Remove' })).not.toBeInTheDocument();
  });

  it('says when a claim has no workings yet', async () => {
    mockApi(workingRoutes([]));
    renderWorkings('science_editor');
    expect(await screen.findByText(/^No workings on this claim yet\./)).toHaveTextContent(
      'Run a calculator in the workbench and save its result here.',
    );
  });

  it('re-runs a working with the current library and lists what changed', async () => {
    const rerun = changedRerun({
      working: { ...layerWorking, libraryVersion: '0.2.0', version: 4 },
      keptBy: null,
    });
    const fake = mockApi({
      ...workingRoutes(),
      [`POST ${layerPath}/rerun`]: { status: 200, body: rerun },
    });
    const { user } = renderWorkings('science_editor');

    const card = await layerCard();
    await user.click(within(card).getByRole('button', { name: 'Re-run with the current library' }));
    const changed = await within(card).findByRole('list', { name: 'Outputs that changed' });
    expect(
      within(card).getByText(/Re-run with library 0.1.0 → 0.2.0: 1 output changed/),
    ).toBeInTheDocument();
    expect(within(changed).getByRole('listitem')).toHaveTextContent(
      'Surface temperature: 287.3 K; 284.8 to 290 K (5th to 95th percentile), median 287.3 K → 288.1 K',
    );
    expect(fake.calls(`POST ${layerPath}/rerun`)[0]?.body).toEqual({ version: 3 });
    // The list is read again, so the card shows the stored re-run.
    expect(fake.calls(`GET ${claimWorkingsPath}`).length).toBeGreaterThanOrEqual(2);
    expect(within(card).queryByText(/^Not stored/)).not.toBeInTheDocument();
  });

  it('says a re-run was not stored when a version sent for sign-off uses the working', async () => {
    mockApi({
      ...workingRoutes(),
      [`POST ${layerPath}/rerun`]: {
        status: 200,
        body: changedRerun({ working: layerWorking, keptBy: 2 }),
      },
    });
    const { user } = renderWorkings('science_editor');
    const card = await layerCard();
    await user.click(within(card).getByRole('button', { name: 'Re-run with the current library' }));
    expect(
      await within(card).findByText(/Re-run with library 0.1.0 → 0.2.0: 1 output changed/),
    ).toBeInTheDocument();
    expect(within(card).getByRole('status')).toHaveTextContent(
      'Not stored: version 2 of the verdict uses this working as it was, and a version sent for sign-off does not change. To bring the new result to readers, correct the verdict with a new working.',
    );
  });

  it('says "unchanged" when a re-run gives the same outputs', async () => {
    mockApi({
      ...workingRoutes(),
      [`POST ${layerPath}/rerun`]: {
        status: 200,
        body: {
          working: { ...layerWorking, version: 4 },
          previousLibraryVersion: '0.1.0',
          libraryVersion: '0.1.0',
          keptBy: null,
          changed: false,
          differences: [],
        } satisfies WorkingRerunResponse,
      },
    });
    const { user } = renderWorkings('desk_chief');
    const card = await layerCard();
    await user.click(within(card).getByRole('button', { name: 'Re-run with the current library' }));
    expect(
      await within(card).findByText(
        'Re-run with library 0.1.0: unchanged. Every output is the same as before.',
      ),
    ).toBeInTheDocument();
  });

  it('shows the stale message and reloads when the note was changed meanwhile (409)', async () => {
    const theirs = { ...layerWorking, note: 'Their newer note.', version: 5 };
    const fake = mockApi({
      ...workingRoutes(),
      [`PATCH ${layerPath}`]: () => {
        fake.use({ [`GET ${claimWorkingsPath}`]: { status: 200, body: [theirs, trendWorking] } });
        return apiError(409, 'This working was changed by someone else meanwhile (now version 5)', {
          version: 'stale',
        });
      },
    });
    const { user } = renderWorkings('science_editor');

    const card = await layerCard();
    await user.click(within(card).getByRole('button', { name: 'Edit the note' }));
    const form = within(card).getByRole('form', { name: 'Edit the note' });
    const note = within(form).getByLabelText('Note');
    await user.clear(note);
    await user.type(note, 'Mine.');
    await user.click(within(form).getByRole('button', { name: 'Save the note' }));

    expect(await within(form).findByRole('alert')).toHaveTextContent(
      'Someone else changed this working meanwhile, so your change was not saved.',
    );
    expect(fake.calls(`PATCH ${layerPath}`)[0]?.body).toEqual({ note: 'Mine.', version: 3 });
    expect(fake.calls(`GET ${claimWorkingsPath}`).length).toBeGreaterThanOrEqual(2);

    // Saving again sends the version now stored.
    fake.use({
      [`PATCH ${layerPath}`]: { status: 200, body: { ...theirs, note: 'Mine.', version: 6 } },
    });
    await user.click(within(form).getByRole('button', { name: 'Save the note' }));
    expect(await screen.findByText('The note is saved.')).toBeInTheDocument();
    expect(fake.calls(`PATCH ${layerPath}`)[1]?.body).toEqual({ note: 'Mine.', version: 5 });
  });

  it('removes a working only after a confirmation', async () => {
    const fake = mockApi({
      ...workingRoutes(),
      [`DELETE ${layerPath}`]: () => {
        fake.use({ [`GET ${claimWorkingsPath}`]: { status: 200, body: [trendWorking] } });
        return { status: 204 };
      },
    });
    const { user } = renderWorkings('science_editor');

    const card = await layerCard();
    await user.click(within(card).getByRole('button', { name: 'Remove' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Remove this working?' });
    expect(fake.calls(`DELETE ${layerPath}`)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Remove the working' }));

    expect(
      await screen.findByText('The working “Layer model of the greenhouse effect” is removed.'),
    ).toBeInTheDocument();
    expect(fake.calls(`DELETE ${layerPath}`)).toHaveLength(1);
    expect(
      screen.queryByRole('article', { name: 'Layer model of the greenhouse effect' }),
    ).not.toBeInTheDocument();
  });
});
