// Water data: which water data the type-A methods read. Measured tables are loaded here once
// the compute API can parse them; until then the panel says so.
export function WaterDataPanel({ width: _width }: { width: number }) {
  return (
    <section className="mount-empty" data-testid="water-panel">
      <h2>Water data</h2>
      <p>
        Type-A methods read water data: TMR against depth and field size, and scatter factors.
        Loading a measured table is not available in this build yet.
      </p>
    </section>
  );
}
