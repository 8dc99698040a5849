// Latest-wins scheduling for background calculations: at most one request in flight and at most
// one waiting; a newer request replaces the waiting one (edits never pile up in a queue). A
// result is shown only if it is newer than the one on screen, so a newer edit always wins; while
// a drag goes on, each finished calculation still repaints (marked `superseded` when a newer
// request is already waiting).

export type LatestResult<R> = { ok: true; value: R } | { ok: false; error: unknown };

export interface LatestOnly<I> {
  /** Ask for a calculation of `input`; returns its request id. */
  request(input: I): number;
  /** Id of the newest request. */
  latestId(): number;
  /** Forget anything waiting and ignore results of requests made so far. */
  cancel(): void;
}

export function makeLatestOnly<I, R>(
  run: (input: I) => Promise<R>,
  deliver: (result: LatestResult<R>, id: number, superseded: boolean) => void,
  onStart?: (id: number) => void,
): LatestOnly<I> {
  let nextId = 0;
  let shown = 0;
  let inFlight = false;
  let waiting: { id: number; input: I } | null = null;

  const start = (id: number, input: I) => {
    inFlight = true;
    onStart?.(id);
    run(input).then(
      (value) => finish(id, { ok: true, value }),
      (error: unknown) => finish(id, { ok: false, error }),
    );
  };
  const finish = (id: number, result: LatestResult<R>) => {
    inFlight = false;
    const w = waiting;
    waiting = null;
    if (id > shown) {
      shown = id;
      deliver(result, id, w !== null);
    }
    if (w) start(w.id, w.input);
  };
  return {
    request(input: I) {
      nextId += 1;
      if (inFlight) waiting = { id: nextId, input };
      else start(nextId, input);
      return nextId;
    },
    latestId: () => nextId,
    cancel() {
      waiting = null;
      shown = nextId;
    },
  };
}
