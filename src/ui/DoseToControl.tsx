// The page-wide dose convention: dose to water or dose to medium, for every method (type A,
// pencil beam, superposition, Monte Carlo), the charts, the check and the record. Opening a case
// or plan sets it from the file (water when the file names none), as the command line does.
import { DOSE_QUANTITIES, doseQuantityLabel, type DoseQuantity } from '../engine/dose/doseQuantity';
import { useAppStore } from '../state/store';
import { setDoseTo } from './check/checkStore';

export function DoseToControl() {
  const doseTo = useAppStore((s) => s.check.doseTo);
  return (
    <label
      className="inline"
      title="Type-A methods compute dose to water and convert with (μ_en/ρ) ratios; the kernel engines and the Monte Carlo compute dose to medium and convert with stopping-power ratios"
    >
      <span>Dose reported as</span>
      <select
        value={doseTo}
        data-testid="dose-to"
        onChange={(e) => setDoseTo(e.target.value as DoseQuantity)}
      >
        {DOSE_QUANTITIES.map((q) => (
          <option key={q} value={q}>
            {doseQuantityLabel(q)}
          </option>
        ))}
      </select>
    </label>
  );
}
