// What the page's Monte Carlo models and what it leaves out, in a few plain sentences.
export function McExplanation() {
  return (
    <details className="mc-explain" open>
      <summary>What this Monte Carlo models — and what it does not</summary>
      <ul>
        <li>
          Models: a point source at the set-up&apos;s SSD with the field defined at 100 cm, photon
          energies drawn from a published spectrum of the beam energy, and coupled photon–electron
          transport through the slabs (Compton, photoelectric, pair production; condensed-history
          electrons with multiple scattering), from tabulated cross sections and stopping powers.
        </li>
        <li>
          Each run simulates three phantoms with the same seed: the case, water with the same set-up
          (for CF = D_het / D_water) and a 10 × 10 cm², SSD 100 water calibration. With the modelled
          beam the calibration turns dose per photon into dose per MU (scaled by the modelled
          reference dose rate and S_c); with a measured table the dose per MU is CF × the
          table&apos;s water dose per MU at the same depth, so the Monte Carlo differs from the
          other methods only by its heterogeneity physics.
        </li>
        <li>
          Does not model the treatment head (no flattening filter, jaws or head scatter beyond the
          S_c factor) or off-axis softening; contaminant electrons from the head are launched with
          the photons from the modelled beam's fitted model (surface and build-up doses). The
          phantom is laterally infinite slabs.
        </li>
        <li>
          Uncertainty is statistical only, shown as 1σ (batch method): it shrinks as 1/√histories.
          It does not include the model&apos;s systematic errors.
        </li>
      </ul>
    </details>
  );
}
