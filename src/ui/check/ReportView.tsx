// The printable record as HTML, from the same report model as the PDF. Shown only when printing
// (the print stylesheet hides the rest of the page).
import type { ReportModel } from '../../io/report/reportModel';
import { FigureSvg } from './FigureSvg';

export function ReportView({ model }: { model: ReportModel }) {
  return (
    <article className="check-record" data-testid="check-record" aria-label="Printable record">
      <h1>{model.title}</h1>
      {model.blocks.map((b, i) => {
        switch (b.kind) {
          case 'heading':
            return <h2 key={i}>{b.text}</h2>;
          case 'paragraph':
            return <p key={i}>{b.text}</p>;
          case 'list':
            return (
              <ul key={i}>
                {b.items.map((t, k) => (
                  <li key={k}>{t}</li>
                ))}
              </ul>
            );
          case 'table':
            return (
              <table key={i} className="record-table">
                {b.caption ? <caption>{b.caption}</caption> : null}
                <thead>
                  <tr>
                    {b.headers.map((h, k) => (
                      <th key={k} scope="col">
                        {h}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {b.rows.map((r, k) => (
                    <tr key={k}>
                      {r.map((c, j) => (
                        <td key={j}>{c}</td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            );
          case 'figure':
            return <FigureSvg key={i} figure={b.figure} width={680} height={240} />;
          case 'signature':
            return (
              <div key={i} className="record-signature">
                {b.lines.map((l, k) => (
                  <p key={k}>{l}</p>
                ))}
              </div>
            );
        }
        return null;
      })}
      <p className="record-footer">
        Lamina {model.appVersion} · {model.timestampIso} · teaching and independent-check aid
      </p>
    </article>
  );
}
