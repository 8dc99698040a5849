// Water data: load a measured TMR or PDD table and scatter factors (file or paste), see them
// checked (problems name row and column) and plotted, and choose what the case's type-A methods
// read: the modelled beam of the case's energy, or the measured table carried in the case.
import { useAppStore, editCase, setNotice, setWaterSource } from '../state/store';
import {
  checkWaterDraft,
  draftOf,
  EMPTY_WATER_DRAFT,
  patchWaterDraft,
  useWaterDraft,
  type WaterDraft,
} from '../state/waterDraft';
import { seriesStyles } from '../plots/palette';
import { CurveChart } from './CurveChart';
import { loadDemoTables } from './demoTables';
import { readTextFile } from './readTextFile';

/** Largest table file read: a case carries at most 500 000 characters of table text. */
export const MAX_TABLE_FILE_BYTES = 2 * 1024 * 1024;

/** Read a picked table file, refusing one far too large or unreadable with a notice. */
function readTableFile(f: File, onText: (name: string, text: string) => void): void {
  const refuse = (why: string) =>
    setNotice({ kind: 'error', title: `${f.name} was not read.`, lines: [why] });
  if (f.size > MAX_TABLE_FILE_BYTES) {
    refuse(
      `${(f.size / 1024 / 1024).toFixed(1)} MB is too large for a water table (at most ${MAX_TABLE_FILE_BYTES / 1024 / 1024} MB)`,
    );
    return;
  }
  void readTextFile(f).then((r) => {
    if (!r.ok) return refuse(r.problem);
    onText(f.name, r.text);
    // The encoding is named when it is not plain UTF-8 (as the command line does).
    if (r.note) setNotice({ kind: 'info', title: `Read ${f.name}`, lines: [r.note] });
  });
}

function FileInput({
  label,
  onText,
  testId,
}: {
  label: string;
  onText: (name: string, text: string) => void;
  testId: string;
}) {
  return (
    <label className="inline file-input">
      <span>{label}</span>
      <input
        type="file"
        accept=".csv,.txt,text/csv,text/plain"
        data-testid={testId}
        onChange={(e) => {
          const f = e.target.files?.[0];
          e.target.value = '';
          if (f) readTableFile(f, onText);
        }}
      />
    </label>
  );
}

function TablePlot({ width, check }: { width: number; check: ReturnType<typeof checkWaterDraft> }) {
  if (!check.ok) return null;
  const g = check.summary.tmrGrid;
  // Up to six field sizes, spread over the table, so the curves stay readable.
  const n = g.sidesCm.length;
  const pick =
    n <= 6
      ? g.sidesCm.map((_, j) => j)
      : [0, 1, 2, 3, 4, 5].map((k) => Math.round((k * (n - 1)) / 5));
  const ids = pick.map((j) => `s${g.sidesCm[j]}`);
  const styles = seriesStyles(ids.map((_, k) => `table-${k}`));
  return (
    <CurveChart
      title="TMR used by the engine, by field size at depth"
      testId="water-chart"
      depthCm={g.depthsCm}
      maxDepthCm={g.depthsCm[g.depthsCm.length - 1] ?? 1}
      series={pick.map((j, k) => {
        const st = styles.get(`table-${k}`)!;
        return {
          id: ids[k]!,
          label: `${g.sidesCm[j]} × ${g.sidesCm[j]} cm²`,
          color: st.color,
          dash: st.dash,
          values: g.tmr.map((row) => row[j] ?? null),
        };
      })}
      axisLabel="TMR (ratio)"
      xLabel="Depth in water (cm)"
      legend
      width={width}
      height={260}
      interfacesCm={[]}
      digits={4}
      yInclude={[0]}
    />
  );
}

export function WaterDataPanel({ width }: { width: number }) {
  const draft = useWaterDraft();
  const inCase = useAppStore((s) => s.history.present.waterData);
  const source = useAppStore((s) => s.waterSource);
  const energy = useAppStore((s) => s.history.present.beam.energy);
  const check = checkWaterDraft(draft);
  const set = (patch: Partial<WaterDraft>) => patchWaterDraft(patch);
  const same =
    check.ok && inCase !== undefined && JSON.stringify(check.waterData) === JSON.stringify(inCase);
  return (
    <section className="water" data-testid="water-panel">
      <h2>Water data for the type-A methods</h2>
      <fieldset className="water-source">
        <legend className="sr-only">Water data source</legend>
        <label>
          <input
            type="radio"
            name="water-source"
            checked={source === 'modelled'}
            onChange={() => setWaterSource('modelled')}
            data-testid="source-modelled"
          />{' '}
          Modelled beam ({energy}): generated with this workbench's own kernels and a
          contaminant-electron model fitted to published surface doses. A model, not a commissioned
          beam.
        </label>
        <label>
          <input
            type="radio"
            name="water-source"
            checked={source === 'case'}
            onChange={() => setWaterSource('case')}
            data-testid="source-table"
          />{' '}
          The case's own measured table (the default; as on the command line)
          {inCase ? (
            <>
              : <strong>{inCase.fileName}</strong> ({inCase.kind.toUpperCase()}
              {inCase.kind === 'pdd' ? ` at SSD ${inCase.ssdCm} cm` : ''})
              {inCase.scatterFileName
                ? ` with scatter factors ${inCase.scatterFileName}`
                : ', no scatter factors'}
            </>
          ) : (
            ': none in this case, so the modelled beam is used'
          )}
        </label>
      </fieldset>
      {inCase ? (
        <p data-testid="water-in-case">
          <button type="button" onClick={() => patchWaterDraft(draftOf(inCase))}>
            Edit the case's table
          </button>{' '}
          <button
            type="button"
            onClick={() => {
              editCase((c) => ({ ...c, waterData: undefined }));
              setWaterSource('modelled');
            }}
          >
            Remove the table from the case
          </button>
        </p>
      ) : (
        <p className="hint">
          No measured table in this case. Load one below, or{' '}
          <button type="button" onClick={loadDemoTables} data-testid="load-demo-water">
            use the demo 6 MV table (invented data)
          </button>
          .
        </p>
      )}

      <h3>Load a table</h3>
      <div className="row">
        <div className="field">
          <label htmlFor="wkind">Table kind</label>
          <select
            id="wkind"
            value={draft.kind}
            onChange={(e) => set({ kind: e.target.value === 'pdd' ? 'pdd' : 'tmr' })}
          >
            <option value="tmr">TMR (depth × field at depth)</option>
            <option value="pdd">PDD (depth × field at surface)</option>
          </select>
        </div>
        {draft.kind === 'pdd' ? (
          <div className="field">
            <label htmlFor="wssd">Table SSD (cm)</label>
            <input
              id="wssd"
              type="text"
              value={draft.ssdText}
              onChange={(e) => set({ ssdText: e.target.value })}
            />
          </div>
        ) : null}
        <div className="field">
          <label htmlFor="wdmax">d_max (cm, blank = from table)</label>
          <input
            id="wdmax"
            type="text"
            value={draft.dMaxText}
            onChange={(e) => set({ dMaxText: e.target.value })}
          />
        </div>
        <div className="field">
          <label htmlFor="wref">Reference dose rate (cGy/MU, blank = 1)</label>
          <input
            id="wref"
            type="text"
            value={draft.referenceText}
            onChange={(e) => set({ referenceText: e.target.value })}
          />
        </div>
      </div>
      <div className="two-col">
        <div>
          <FileInput
            label="Depth table file"
            testId="water-file"
            onText={(fileName, csv) => set({ fileName, csv })}
          />
          <label htmlFor="wcsv" className="sr-only">
            Depth table CSV
          </label>
          <textarea
            id="wcsv"
            rows={8}
            spellCheck={false}
            placeholder={
              'Paste CSV: first row "depth cm \\ field cm", field sides…; then one row per depth'
            }
            value={draft.csv}
            onChange={(e) =>
              set({ csv: e.target.value, fileName: draft.fileName || 'pasted table' })
            }
          />
        </div>
        <div>
          <FileInput
            label="Scatter factors file (optional)"
            testId="scatter-file"
            onText={(scatterFileName, scatterCsv) => set({ scatterFileName, scatterCsv })}
          />
          <label htmlFor="wsc" className="sr-only">
            Scatter factors CSV
          </label>
          <textarea
            id="wsc"
            rows={8}
            spellCheck={false}
            placeholder="Paste CSV: field cm, S_c, S_p[, PSF]"
            value={draft.scatterCsv}
            onChange={(e) =>
              set({
                scatterCsv: e.target.value,
                scatterFileName: draft.scatterFileName || 'pasted scatter factors',
              })
            }
          />
        </div>
      </div>
      {draft.csv.trim() !== '' && !check.ok ? (
        <div className="notice error" role="alert" data-testid="water-problems">
          <strong>The table has problems:</strong>
          <ul>
            {check.problems.map((p, i) => (
              <li key={i}>{p}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {check.ok ? (
        <div className="water-summary">
          <p>
            {check.summary.kind.toUpperCase()} table, depths {check.summary.depthRangeCm[0]}–
            {check.summary.depthRangeCm[1]} cm, fields {check.summary.fieldRangeCm[0]}–
            {check.summary.fieldRangeCm[1]} cm, d_max {check.summary.dMaxCm} cm
            {check.summary.dMaxInferred ? ' (from the table)' : ''}; SHA-256{' '}
            <code>{check.summary.sha256.slice(0, 12)}</code>.
          </p>
          {check.summary.notes.length ? (
            <ul className="hint">
              {check.summary.notes.map((n, i) => (
                <li key={i}>{n}</li>
              ))}
            </ul>
          ) : null}
          <p className="hint">{check.summary.source}</p>
          <button
            type="button"
            className="primary"
            disabled={same}
            data-testid="use-water"
            onClick={() => {
              editCase((c) => ({ ...c, waterData: check.waterData }));
              setWaterSource('case');
            }}
          >
            {same ? 'This is the case’s table' : 'Use this table in the case'}
          </button>{' '}
          <button type="button" onClick={() => patchWaterDraft({ ...EMPTY_WATER_DRAFT })}>
            Clear
          </button>
          <TablePlot width={width} check={check} />
          {check.summary.scatter ? (
            <table className="point-table">
              <caption>Scatter factors</caption>
              <thead>
                <tr>
                  <th scope="col">Field (cm)</th>
                  <th scope="col">S_c</th>
                  <th scope="col">S_p</th>
                  {check.summary.scatter.psf ? <th scope="col">PSF</th> : null}
                </tr>
              </thead>
              <tbody>
                {check.summary.scatter.sidesCm.map((s, i) => (
                  <tr key={s}>
                    <td className="num">{s}</td>
                    <td className="num">{check.summary.scatter!.sc[i]?.toFixed(4)}</td>
                    <td className="num">{check.summary.scatter!.sp[i]?.toFixed(4)}</td>
                    {check.summary.scatter!.psf ? (
                      <td className="num">{check.summary.scatter!.psf[i]?.toFixed(4)}</td>
                    ) : null}
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
