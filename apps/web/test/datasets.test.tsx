import type { DatasetDetail, Role } from '@skyledger/contracts';
import { screen, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { apiError, mockApi, type Routes } from './api-mock';
import { datasetList, stationDataset, stationDatasetId, uploadOf } from './dataset-fixtures';
import { sessionFor } from './fixtures';
import { renderApp } from './render-app';

function sessionRoutes(role: Role): Routes {
  return { 'POST /api/auth/refresh': { status: 200, body: sessionFor(role) } };
}

const badCsv = 'station_id,year,anomaly_k\nMRW,2014,0.31\nMRW,2015,n/a\nMRW,2016,0.87\n';
const goodCsv = 'station_id,year,anomaly_k\nMRW,2014,0.31\nMRW,2015,0.42\nMRW,2016,0.87\n';
const csvFile = (text: string) => new File([text], 'marrowby-station.csv', { type: 'text/csv' });
const rowsOf = (text: string) =>
  text
    .trim()
    .split('\n')
    .slice(1)
    .map((line) => line.split(','));

describe('datasets', { timeout: 20_000 }, () => {
  // The pages show units with @skyledger/calc's display helpers; under Vitest its entry
  // loads the whole library (mathjs too, which a build leaves out): load it once up front.
  beforeAll(() => import('@skyledger/calc'));

  it('lists the datasets with their columns, units, rows and time range', async () => {
    mockApi({
      ...sessionRoutes('reporter'),
      'GET /api/datasets': { status: 200, body: datasetList },
    });
    renderApp('/datasets');

    const table = await screen.findByRole('table', { name: 'Datasets on the desk, newest first' });
    const [, station, dayNight] = within(table).getAllByRole('row');
    expect(within(station!).getByRole('link', { name: stationDataset.name })).toHaveAttribute(
      'href',
      `/datasets/${stationDatasetId}`,
    );
    expect(station).toHaveTextContent('Station anomaly (K)');
    expect(station).toHaveTextContent('2014–2018');
    expect(station).toHaveTextContent('Tobias Renn');
    // Monthly times are shown as the months they stand for.
    expect(dayNight).toHaveTextContent('1979-01–2025-12');
    expect(dayNight).toHaveTextContent('Night (minimum) (K)Day (maximum) (K)');
    expect(dayNight).toHaveTextContent('564');
    // Reporters read datasets; only science editors and desk chiefs import them.
    expect(screen.queryByRole('link', { name: 'Import a dataset' })).not.toBeInTheDocument();
  });

  it('says when the desk has no datasets yet', async () => {
    mockApi({ ...sessionRoutes('science_editor'), 'GET /api/datasets': { status: 200, body: [] } });
    renderApp('/datasets');
    expect(await screen.findByText(/No datasets on the desk yet/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Import a dataset' })).toHaveAttribute(
      'href',
      '/datasets/new',
    );
  });

  it('keeps the import page to the roles that import', async () => {
    mockApi(sessionRoutes('copy_desk'));
    renderApp('/datasets/new');
    expect(
      await screen.findByRole('heading', { level: 1, name: "You don't have access" }),
    ).toBeInTheDocument();
    expect(screen.getByText(/Import a dataset page is open to these roles only/)).toHaveTextContent(
      'science editor, desk chief',
    );
  });

  it('imports the chosen columns; a refused file lists its bad lines and a fixed one goes through', async () => {
    const created: DatasetDetail = {
      ...stationDataset,
      rowCount: 3,
      rows: [
        [2014, 0.31],
        [2015, 0.42],
        [2016, 0.87],
      ],
    };
    const fake = mockApi({
      ...sessionRoutes('science_editor'),
      'POST /api/datasets/uploads': {
        status: 201,
        body: uploadOf('marrowby-station.csv', rowsOf(badCsv)),
      },
      'POST /api/datasets': apiError(
        422,
        'Nothing was imported. line 3, anomaly_k: "n/a" is not a number; line 5, year: repeats the time of line 4.',
        {
          'line 3: anomaly_k': '"n/a" is not a number',
          'line 5: year': 'repeats the time of line 4',
        },
      ),
    });
    const { user, location } = renderApp('/datasets/new');

    await user.upload(await screen.findByLabelText('CSV file'), csvFile(badCsv));
    await user.click(screen.getByRole('button', { name: 'Upload' }));
    expect(
      await screen.findByText(/Uploaded marrowby-station.csv: 3 columns, 3 rows/),
    ).toBeInTheDocument();
    const uploaded = fake.calls('POST /api/datasets/uploads')[0]?.body as FormData;
    expect((uploaded.get('file') as File).name).toBe('marrowby-station.csv');
    const preview = screen.getByRole('table', {
      name: /The first 3 of 3 rows of marrowby-station.csv/,
    });
    expect(within(preview).getByRole('cell', { name: 'n/a' })).toBeInTheDocument();

    // The year column is taken for the time; the station code is left out, the anomaly kept.
    const form = screen.getByRole('form', { name: 'Import the dataset' });
    expect(within(form).getByRole('combobox', { name: 'Time column' })).toHaveTextContent('year');
    await user.click(within(form).getByRole('checkbox', { name: 'Import “station_id”' }));
    await user.click(within(form).getByRole('button', { name: 'Import the dataset' }));
    expect(
      await within(form).findByText('Give the unit of this column, e.g. K or ppm'),
    ).toBeInTheDocument();
    expect(within(form).getByLabelText('Description')).toHaveAccessibleDescription(
      /Say where the data came from/,
    );
    expect(fake.calls('POST /api/datasets')).toHaveLength(0);

    await user.type(within(form).getByLabelText('Unit of “anomaly_k”'), 'K');
    await user.type(
      within(form).getByLabelText('Label of “anomaly_k” (optional)'),
      'Station anomaly',
    );
    await user.type(
      within(form).getByLabelText('Name'),
      'SYNTHETIC Marrowby station annual anomalies',
    );
    await user.type(
      within(form).getByLabelText('Description'),
      'SYNTHETIC: invented for this test by the desk.',
    );
    await user.click(within(form).getByRole('button', { name: 'Import the dataset' }));

    const problems = await within(form).findByRole('list', { name: 'Problems in the file' });
    expect(
      within(problems)
        .getAllByRole('listitem')
        .map((item) => item.textContent),
    ).toEqual([
      'Line 3, column “anomaly_k”: "n/a" is not a number',
      'Line 5, column “year”: repeats the time of line 4',
    ]);
    expect(within(form).getByRole('alert')).toHaveTextContent(
      'Nothing was imported: 2 lines of the file have problems.',
    );
    expect(fake.calls('POST /api/datasets')[0]?.body).toEqual({
      attachmentId: '2c8e4f10-1b2a-4c3d-9e4f-6a00000000f1',
      name: 'SYNTHETIC Marrowby station annual anomalies',
      description: 'SYNTHETIC: invented for this test by the desk.',
      timeColumn: 'year',
      valueColumns: [{ column: 'anomaly_k', unit: 'K', label: 'Station anomaly' }],
    });

    // The corrected file goes up again; the choices made stay.
    const fixed = { ...uploadOf('marrowby-station.csv', rowsOf(goodCsv)) };
    fixed.attachment = { ...fixed.attachment, id: '2c8e4f10-1b2a-4c3d-9e4f-6a00000000f2' };
    fake.use({
      'POST /api/datasets/uploads': { status: 201, body: fixed },
      'POST /api/datasets': { status: 201, body: created },
      [`GET /api/datasets/${stationDatasetId}`]: { status: 200, body: created },
    });
    await user.upload(screen.getByLabelText('Another CSV file, to replace it'), csvFile(goodCsv));
    await user.click(screen.getByRole('button', { name: 'Upload' }));
    await screen.findByRole('cell', { name: '0.42' });
    expect(screen.queryByRole('list', { name: 'Problems in the file' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Import the dataset' }));

    expect(
      await screen.findByRole('heading', { level: 1, name: stationDataset.name }),
    ).toBeInTheDocument();
    expect(location()).toBe(`/datasets/${stationDatasetId}`);
    expect(screen.getByText('Imported 3 rows of one column.')).toBeInTheDocument();
    expect(fake.calls('POST /api/datasets')[1]?.body).toMatchObject({
      attachmentId: '2c8e4f10-1b2a-4c3d-9e4f-6a00000000f2',
      timeColumn: 'year',
      valueColumns: [{ column: 'anomaly_k', unit: 'K', label: 'Station anomaly' }],
    });
  });

  it('refuses a file that is not a CSV, saying so', async () => {
    mockApi({
      ...sessionRoutes('desk_chief'),
      'POST /api/datasets/uploads': apiError(
        415,
        'This needs a CSV file (a header row, then rows of the same width); the file is application/pdf',
        { file: 'unsupportedType' },
      ),
    });
    const { user } = renderApp('/datasets/new');
    await user.upload(
      await screen.findByLabelText('CSV file'),
      // Named .csv, but the API reads the bytes, which are a PDF's.
      new File(['%PDF-1.7'], 'report.csv', { type: 'text/csv' }),
    );
    await user.click(screen.getByRole('button', { name: 'Upload' }));
    expect(
      await screen.findByText(
        'The desk imports datasets from CSV files only: a header row, then rows of the same width.',
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Import the dataset' })).not.toBeInTheDocument();
  });

  it('shows a dataset: its description, each column in words and as a table, and its CSV', async () => {
    const csv = new Blob(['year,anomaly_k\n2014,0.31\n'], { type: 'text/csv' });
    const fake = mockApi({
      ...sessionRoutes('copy_desk'),
      [`GET /api/datasets/${stationDatasetId}`]: { status: 200, body: stationDataset },
      [`GET /api/attachments/${stationDataset.attachmentId}`]: { status: 200, body: csv },
    });
    const { user } = renderApp(`/datasets/${stationDatasetId}`);

    expect(
      await screen.findByRole('heading', { level: 1, name: stationDataset.name }),
    ).toBeInTheDocument();
    expect(screen.getByText(stationDataset.description)).toBeInTheDocument();
    const figure = screen.getByRole('figure', { name: 'Station anomaly (K)' });
    expect(figure).toHaveTextContent(
      'Station anomaly from 2014 to 2018, 5 values: lowest −0.12 K (2018), highest 0.87 K (2016); first 0.31 K, last −0.12 K.',
    );
    await user.click(within(figure).getByText('Show the data as a table'));
    const data = await within(figure).findByRole('table', { name: 'Station anomaly (K): data' });
    expect(
      within(data)
        .getAllByRole('row')
        .map((row) => row.textContent),
    ).toEqual([
      'TimeStation anomaly (K)',
      '20140.31',
      '20150.42',
      '20160.87',
      '20170.55',
      '2018−0.12',
    ]);

    await user.click(screen.getByRole('button', { name: 'Download the original CSV' }));
    const [download] = fake.calls(`GET /api/attachments/${stationDataset.attachmentId}`);
    expect(download?.headers.get('Authorization')).toBe('Bearer token-copy_desk');
  });

  it('says a dataset that does not exist is not found', async () => {
    const missing = '9a1d3c55-7e20-4b1a-8c3f-5e00000000ff';
    mockApi({
      ...sessionRoutes('reporter'),
      [`GET /api/datasets/${missing}`]: apiError(404, 'No such dataset on the desk'),
    });
    renderApp(`/datasets/${missing}`);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Page not found' }),
    ).toBeInTheDocument();
  });
});
