// Plain-text rendering of a calculation report for the terminal. Stable layout, documented in
// the README: a header, the layer table, the point table, then one table per method.
import { doseQuantityLabel } from '../engine/dose/doseQuantity';
import type { CalcReport } from '../contract/reports';
import type { Warning } from '../engine/equilibrium';

function pad(s: string, n: number): string {
  return s.length >= n ? s : s + ' '.repeat(n - s.length);
}
function num(v: number | null | undefined, digits: number): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '—' : v.toFixed(digits);
}

export function table(headers: string[], rows: string[][]): string {
  const widths = headers.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: string[]) =>
    cells
      .map((c, i) => pad(c, widths[i] ?? 0))
      .join('  ')
      .trimEnd();
  return [line(headers), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

export function formatReport(r: CalcReport): string {
  const out: string[] = [];
  out.push(`Case: ${r.caseName || '(unnamed)'}`);
  out.push(
    `Beam: ${r.beam.energy}, ${r.beam.setup} (SSD ${num(r.beam.ssdCm, 1)} cm), field ${r.beam.fieldXCm} × ${r.beam.fieldYCm} cm at 100 cm`,
  );
  out.push(`Dose reported as: ${doseQuantityLabel(r.doseTo)} (every method)`);
  out.push('');
  out.push('Layers');
  out.push(
    table(
      ['#', 'material', 'top cm', 'bottom cm', 'thickness cm', 'density g/cm3', 'rel. e- density'],
      r.layers.map((l) => [
        String(l.index + 1),
        l.material,
        num(l.topCm, 2),
        num(l.bottomCm, 2),
        num(l.thicknessCm, 2),
        num(l.densityGPerCm3, 4),
        num(l.relativeElectronDensity, 4),
      ]),
    ),
  );
  out.push('');
  out.push('Points of interest');
  out.push(
    table(
      ['id', 'depth cm', 'radiological depth cm', 'layer'],
      r.points.map((p) => [
        p.id,
        num(p.depthCm, 2),
        num(p.radiologicalDepthCm, 3),
        String(p.layerIndex + 1),
      ]),
    ),
  );
  for (const m of r.methods) {
    out.push('');
    out.push(
      `Method ${m.id}: ${m.label} [${m.variant}] (${m.methodClass}; water data: ${m.waterData})`,
    );
    if (m.dose) out.push(`  ${doseQuantityLabel(m.dose.quantity)}: ${m.dose.conversion}`);
    out.push(
      table(
        ['point', 'depth cm', 'CF', 'dose/MU cGy', '1 sigma cGy', 'flags'],
        m.points.map((p) => [
          p.id,
          num(p.depthCm, 2),
          num(p.cf, 4),
          num(p.dosePerMuCGy, 4),
          p.sigmaDosePerMuCGy === undefined || p.dosePerMuCGy === null
            ? ''
            : num(p.sigmaDosePerMuCGy, 4),
          p.flags.join(', '),
        ]),
      ),
    );
  }
  for (const u of r.unavailable) out.push(`\nMethod ${u.id}: not computed (${u.reason})`);
  out.push('');
  out.push(...formatWarnings(r.warnings));
  out.push('');
  out.push('Cautions');
  for (const c of r.cautions) out.push(`- ${c}`);
  return out.join('\n');
}

/**
 * The "Warnings" section: a table (id, severity, depth range, points, methods) followed by the
 * numbers, explanation and advice of each warning.
 */
export function formatWarnings(warnings: readonly Warning[]): string[] {
  const out = ['Warnings'];
  if (warnings.length === 0) {
    out.push('(none)');
    return out;
  }
  out.push(
    table(
      ['id', 'severity', 'depth cm', 'points', 'concerns', 'approximate', 'unaffected'],
      warnings.map((w) => [
        w.id,
        w.severity,
        `${num(w.depthRangeCm.fromCm, 2)}–${num(w.depthRangeCm.toCm, 2)}`,
        w.pointIds.join(', '),
        w.methods.concerned.join(', '),
        w.methods.approximate.join(', '),
        w.methods.unaffected.join(', '),
      ]),
    ),
  );
  for (const w of warnings) {
    out.push('');
    out.push(`${w.id} (${w.severity}): ${w.numbers}`);
    out.push(`  ${w.explanation}`);
    out.push(`  What to do: ${w.advice}`);
  }
  return out;
}
