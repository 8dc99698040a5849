// Which answer reaches the screen when two calculations run side by side for every edit: a quick
// preview and the full report. Edits are numbered; the screen never goes back to an older edit, a
// full report of an edit replaces its preview, and a preview never replaces its own full report.

export interface ShowGate {
  /** A full answer (or failure) for edit `seq`: shown unless a newer edit's preview is on screen. */
  full(seq: number): boolean;
  /** A preview for edit `seq`: shown only if nothing of this or a newer edit is on screen. */
  preview(seq: number): boolean;
}

export function makeShowGate(): ShowGate {
  let shown = 0;
  return {
    full(seq) {
      if (seq < shown) return false;
      shown = seq;
      return true;
    },
    preview(seq) {
      if (seq <= shown) return false;
      shown = seq;
      return true;
    },
  };
}
