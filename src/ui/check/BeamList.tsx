// The beams of the check: beam 1 is the case in the editor; more beams come from case files or a
// plan file (each with its own slab path, set-up, field and the point depths along it).
import { addBeamsFromFile } from './planActions';
import {
  patchExtraBeam,
  patchFirstBeam,
  removeExtraBeam,
  swapIntoEditor,
  useCheckStore,
} from './checkStore';
import { NumInput } from './NumInput';
import { RetryButton } from '../RetryButton';
import { WORKER_PROBLEM_PATH } from './useCheck';

export function BeamList() {
  const first = useCheckStore((s) => s.firstBeam);
  const extra = useCheckStore((s) => s.extraBeams);
  const problems = useCheckStore((s) => s.planProblems);
  const pending = useCheckStore((s) => s.planKey !== s.wantedKey);
  return (
    <div className="check-beams">
      <table className="check-table" data-testid="check-beams">
        <caption>
          Beams (each with its own slab path, set-up and field; points matched by id)
        </caption>
        <thead>
          <tr>
            <th scope="col">Beam id</th>
            <th scope="col">Source</th>
            <th scope="col">Weight</th>
            <th scope="col">Status</th>
            <th scope="col" />
          </tr>
        </thead>
        <tbody>
          <tr>
            <td>
              <input
                aria-label="Beam 1 id"
                value={first.id}
                onChange={(e) => patchFirstBeam({ id: e.target.value || 'beam-1' })}
              />
            </td>
            <td>case in the editor</td>
            <td>
              <NumInput
                label="Weight of beam 1"
                hideLabel
                value={first.weight}
                min={-1e-12}
                onCommit={(v) => patchFirstBeam({ weight: v ?? 1 })}
              />
            </td>
            <td>calculated with the editor</td>
            <td />
          </tr>
          {extra.map((b) => (
            <tr key={b.key}>
              <td>
                <input
                  aria-label={`Beam ${b.id} id`}
                  value={b.id}
                  onChange={(e) => patchExtraBeam(b.key, { id: e.target.value || b.key })}
                />
              </td>
              <td>{b.label || b.case.name}</td>
              <td>
                <NumInput
                  label={`Weight of beam ${b.id}`}
                  hideLabel
                  value={b.weight}
                  min={-1e-12}
                  onCommit={(v) => patchExtraBeam(b.key, { weight: v ?? 1 })}
                />
              </td>
              <td>
                {problems.length > 0
                  ? `not calculated: ${problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`
                  : pending
                    ? 'calculating…'
                    : 'calculated'}
                {problems.some((p) => p.path === WORKER_PROBLEM_PATH) ? <RetryButton /> : null}
              </td>
              <td>
                <button
                  type="button"
                  onClick={() => swapIntoEditor(b.key)}
                  title="Open this beam in the editor as beam 1; the editor's case takes this row"
                  data-testid={`check-edit-beam-${b.id}`}
                >
                  Edit in the editor
                </button>{' '}
                <button type="button" onClick={() => removeExtraBeam(b.key)}>
                  Remove
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="check-actions">
        <label className="file-button">
          Add beam from case file…
          <input
            type="file"
            accept=".json,application/json"
            data-testid="check-add-beam"
            onChange={(e) => void addBeamsFromFile(e, false)}
          />
        </label>
        <label className="file-button">
          Open plan file…
          <input
            type="file"
            accept=".json,application/json"
            data-testid="check-open-plan"
            onChange={(e) => void addBeamsFromFile(e, true)}
          />
        </label>
      </div>
    </div>
  );
}
