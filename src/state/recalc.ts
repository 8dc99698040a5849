// A "calculate again" request from anywhere on the page (e.g. Retry after the compute worker was
// lost) to whoever keeps the calculation in step with the case.
type Listener = () => void;

const listeners = new Set<Listener>();

export function requestRecalc(): void {
  for (const l of listeners) l();
}

/** Listen for recalculation requests; returns the function that stops listening. */
export function onRecalcRequest(listener: Listener): () => void {
  listeners.add(listener);
  return () => {
    listeners.delete(listener);
  };
}
