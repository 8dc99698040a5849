// The water data every type-A method reads: TMR against depth and field, scatter factors, d_max
// and the reference dose rate. Two producers implement it: a measured table imported by the user
// (src/engine/beam/measuredTable*.ts) and the modelled beam generated from our own kernels
// (src/engine/beam/modelledBeam*.ts). Consumers never know which; they print `source`.

/** Where a look-up fell outside the tabulated range (then clamped to the edge). */
export interface ExtrapolationFlag {
  quantity: 'depth' | 'field';
  requested: number;
  clampedTo: number;
}

export interface LookupRecorder {
  /** Called by a water-data look-up that had to clamp. */
  flag(f: ExtrapolationFlag): void;
}

export interface WaterData {
  /** "modelled beam" or "measured table: <file name>" (with a content hash where known). */
  source: string;
  /** Depth of maximum dose on the central axis for 10 × 10 cm² (cm). */
  dMaxCm: number;
  /** Tabulated ranges, for extrapolation flags. */
  depthRangeCm: readonly [number, number];
  fieldRangeCm: readonly [number, number];
  /** Tissue–maximum ratio at a depth (cm) for a square field of side `sideCm` at that depth. */
  tmr(depthCm: number, sideCm: number, recorder?: LookupRecorder): number;
  /** Phantom-scatter factor S_p, normalised to 1 for 10 × 10 cm² (side at the depth of interest). */
  sp(sideCm: number, recorder?: LookupRecorder): number;
  /** Collimator-scatter factor S_c, normalised to 1 for 10 × 10 cm² (side at 100 cm). */
  sc(sideCm: number, recorder?: LookupRecorder): number;
  /** Peak-scatter factor PSF = TAR(d_max, s) (needed by TAR-based Batho and by ETAR). */
  psf(sideCm: number, recorder?: LookupRecorder): number;
  /** Set when `psf` is an approximation (e.g. no PSF supplied with a measured table): how it is made. */
  psfApproximation?: string;
  /**
   * Reference dose rate: cGy per MU at d_max on the central axis, 10 × 10 cm² defined at 100 cm,
   * source-to-point distance 100 + d_max cm (SSD 100 calibration).
   */
  referenceDosePerMuCGy: number;
}
