// One method's written-out CF at the point: the quantities it read, the factors it multiplied and
// their product (all computed in the worker by the method itself), Batho's per-layer factors and
// the superposition's dose parts.
import type { ExplainLayer, MethodExplanation } from '../../contract/explain';
import { num } from './formatNumber';

function BathoTable({ m, layers }: { m: MethodExplanation; layers: ExplainLayer[] }) {
  const rows = m.bathoLayers ?? [];
  return (
    <div className="table-scroll">
      <table className="factor-table" data-testid={`batho-layers-${m.id}`}>
        <caption>
          Per-layer factors T(X_m{m.id === 'batho-modified' ? ' + z_bu' : ''})^(ρ_m − ρ_m−1), ρ₀ ≡ 1
          (water)
        </caption>
        <thead>
          <tr>
            <th scope="col">Layer</th>
            <th scope="col">ρ_m−1 → ρ_m</th>
            <th scope="col">Exponent</th>
            <th scope="col">X_m (cm)</th>
            <th scope="col">T at (cm)</th>
            <th scope="col">T</th>
            <th scope="col">Factor</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((l) => (
            <tr key={l.layerIndex}>
              <th scope="row">
                {l.layerIndex + 1} {layers[l.layerIndex]?.material.replace(/ \(.*\)$/, '') ?? ''}
              </th>
              <td>
                {num(l.previousRho, 4)} → {num(l.rho, 4)}
              </td>
              <td>{num(l.exponent, 4)}</td>
              <td>{num(l.distanceCm, 4)}</td>
              <td>{num(l.readAtCm, 4)}</td>
              <td>{l.depthFunction === null ? 'not read' : num(l.depthFunction)}</td>
              <td>{num(l.factor)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function PartsTable({ m, layers }: { m: MethodExplanation; layers: ExplainLayer[] }) {
  const p = m.parts;
  if (!p?.primary || !p.scatter) return null;
  const share = (v: number) => `${num((100 * v) / p.dosePerMuCGy, 3)} %`;
  return (
    <>
      <table className="factor-table" data-testid={`parts-${m.id}`}>
        <caption>Primary and scatter parts of the kernel (cGy/MU, native dose to medium)</caption>
        <thead>
          <tr>
            <th scope="col">Part</th>
            <th scope="col">Slabs</th>
            <th scope="col">Water</th>
            <th scope="col">Slabs/water</th>
            <th scope="col">Share of the slab dose</th>
          </tr>
        </thead>
        <tbody>
          {(['primary', 'scatter'] as const).map((k) => (
            <tr key={k}>
              <th scope="row">{k === 'primary' ? 'Primary' : 'Scatter'}</th>
              <td>{num(p[k]?.dosePerMuCGy)}</td>
              <td>{num(p[k]?.waterDosePerMuCGy)}</td>
              <td>{num((p[k]?.dosePerMuCGy ?? 0) / (p[k]?.waterDosePerMuCGy ?? 1), 4)}</td>
              <td>{share(p[k]?.dosePerMuCGy ?? 0)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {p.byLayerOfOrigin ? (
        <table className="factor-table" data-testid={`origin-${m.id}`}>
          <caption>Dose by the layer where the TERMA was released (cGy/MU, slabs)</caption>
          <thead>
            <tr>
              <th scope="col">Layer</th>
              <th scope="col">Dose per MU</th>
              <th scope="col">Share</th>
            </tr>
          </thead>
          <tbody>
            {p.byLayerOfOrigin.map((v, j) => (
              <tr key={j}>
                <th scope="row">
                  {j + 1} {layers[j]?.material.replace(/ \(.*\)$/, '') ?? ''}
                </th>
                <td>{num(v)}</td>
                <td>{share(v)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </>
  );
}

export function FactorCard({ m, layers }: { m: MethodExplanation; layers: ExplainLayer[] }) {
  const product = m.factors.length
    ? `${m.factors.map((f) => num(f.value, 6)).join(' × ')} = ${num(m.product, 6)}`
    : '1 (no factors)';
  return (
    <details className="factor-card" open data-testid={`factors-${m.id}`}>
      <summary>
        <span className="factor-title">{m.label}</span>{' '}
        <span className="factor-cf" data-testid={`factor-cf-${m.id}`}>
          CF = {m.cf === null ? 'no value' : num(m.cf, 6)}
        </span>
      </summary>
      {m.quantities.length ? (
        <table className="factor-table">
          <caption>What the method read</caption>
          <thead>
            <tr>
              <th scope="col">Symbol</th>
              <th scope="col">Meaning</th>
              <th scope="col">Value</th>
            </tr>
          </thead>
          <tbody>
            {m.quantities.map((q) => (
              <tr key={q.symbol}>
                <th scope="row">{q.symbol}</th>
                <td>{q.label}</td>
                <td>
                  {num(q.value)}
                  {q.unit ? ` ${q.unit}` : ''}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {m.factors.length ? (
        <table className="factor-table">
          <caption>Factors multiplied, in order</caption>
          <tbody>
            {m.factors.map((f, i) => (
              <tr key={i}>
                <th scope="row">{f.symbol}</th>
                <td>{f.label}</td>
                <td>{num(f.value, 6)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      <p className="factor-product" data-testid={`factor-product-${m.id}`}>
        CF = {product}
      </p>
      {m.bathoLayers ? <BathoTable m={m} layers={layers} /> : null}
      <PartsTable m={m} layers={layers} />
      {m.flags.length ? (
        <ul className="factor-flags">
          {m.flags.map((f, i) => (
            <li key={i}>{f}</li>
          ))}
        </ul>
      ) : null}
    </details>
  );
}
