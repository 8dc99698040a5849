// The point check: beams (the editor's case plus beams from files), the planning system's dose
// or MU, prescription → MU, editable tolerances, verdicts per method, point and beam, the sum over
// beams, and the record (print, PDF) with exports.
import { useEffect, useMemo, useRef } from 'react';
import { createPortal } from 'react-dom';
import { APP_VERSION } from '../../io/report/appVersion';
import { buildReportModel } from '../../io/report/reportModel';
import { depthDoseFigure } from '../../io/report/reportFigure';
import { useAppStore } from '../../state/store';
import { BeamList } from './BeamList';
import { openPlanFromAddress } from './planActions';
import { CheckResults, VerdictBanner } from './CheckResults';
import { patchCheck, useCheckStore } from './checkStore';
import { ExportBar } from './ExportBar';
import { FigureSvg } from './FigureSvg';
import { NumInput } from './NumInput';
import { PlanningValues } from './PlanningValues';
import { ReportView } from './ReportView';
import { useCheckView, usePlanCalculation } from './useCheck';
import './check.css';

function Settings({ methods }: { methods: { id: string; label: string }[] }) {
  const points = useAppStore((s) => s.history.present.points);
  const s = useCheckStore();
  return (
    <fieldset className="check-settings">
      <legend>Prescription and tolerances</legend>
      <label>
        Prescription point{' '}
        <select
          value={s.prescriptionPointId}
          data-testid="rx-point"
          onChange={(e) => patchCheck({ prescriptionPointId: e.target.value })}
        >
          <option value="">(none)</option>
          {points.map((p) => (
            <option key={p.key} value={p.id}>
              {p.id}
            </option>
          ))}
        </select>
      </label>
      <NumInput
        label="Prescribed dose, all beams"
        unit="cGy"
        allowEmpty
        value={s.prescriptionDoseCGy}
        testId="rx-dose"
        onCommit={(v) => patchCheck({ prescriptionDoseCGy: v })}
      />
      <NumInput
        label="Tolerance, homogeneous path"
        unit="%"
        value={s.tolerances.homogeneousPercent}
        testId="tol-homogeneous"
        onCommit={(v) =>
          v !== null && patchCheck({ tolerances: { ...s.tolerances, homogeneousPercent: v } })
        }
      />
      <NumInput
        label="Tolerance, heterogeneous path"
        unit="%"
        value={s.tolerances.heterogeneousPercent}
        testId="tol-heterogeneous"
        onCommit={(v) =>
          v !== null && patchCheck({ tolerances: { ...s.tolerances, heterogeneousPercent: v } })
        }
      />
      <label>
        Deciding method{' '}
        <select
          value={s.checkMethodId}
          data-testid="check-method"
          onChange={(e) => patchCheck({ checkMethodId: e.target.value })}
        >
          <option value="">
            automatic (across a heterogeneity: Monte Carlo when run, else superposition; water-like
            path: ratio of TMR)
          </option>
          {methods.map((m) => (
            <option key={m.id} value={m.id}>
              {m.label}
            </option>
          ))}
        </select>
      </label>
      <p className="help">
        Default action levels: 2 % where the path to the point is water-like and 5 % where it
        crosses a heterogeneity (relative electron density differing from water by 0.1 or more) —
        within AAPM TG-114&apos;s range of action levels for secondary MU checks (from memory). Set
        them from your local protocol. MU = prescribed dose share ÷ dose per MU (AAPM TG-71
        formalism); differences are 100 × (check − planning) / planning.
      </p>
    </fieldset>
  );
}

export function CheckPanel() {
  const inputKey = usePlanCalculation();
  useEffect(() => {
    void openPlanFromAddress();
  }, []);
  const view = useCheckView(inputKey);
  const figureRef = useRef<SVGSVGElement | null>(null);
  const first = view?.reports[0];
  const figure = useMemo(
    () => (first ? depthDoseFigure(first.report, `Depth dose, beam ${first.id}`) : null),
    [first],
  );
  const model = useMemo(
    () =>
      view
        ? buildReportModel({
            plan: view.plan,
            result: view.result,
            date: new Date(),
            appVersion: APP_VERSION,
          })
        : null,
    [view],
  );
  return (
    <section className="check-panel" aria-labelledby="check-h" data-testid="check-panel">
      <h2 id="check-h">Point check</h2>
      <BeamList />
      <Settings methods={view?.check.methods ?? []} />
      <PlanningValues />
      {view ? (
        <>
          <VerdictBanner check={view.check} />
          {view.pending ? (
            <p className="empty" data-testid="check-pending">
              Calculating the check for the current inputs…
            </p>
          ) : null}
          <CheckResults check={view.check} />
          {figure ? <FigureSvg ref={figureRef} figure={figure} /> : null}
          <ExportBar view={view} figureRef={figureRef} />
        </>
      ) : (
        <p className="empty">Waiting for the first calculation…</p>
      )}
      {model
        ? createPortal(
            <div className="check-print-root">{<ReportView model={model} />}</div>,
            document.body,
          )
        : null}
    </section>
  );
}
