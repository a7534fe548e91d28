package org.eigenzeit.ground.timescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.time.TimeScales;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * The numerical time relations along DE405 against published values: IAU SOFA's TDB - TT
 * (Fairhead and Bretagnon 1990 series, jsofa {@code jauDtdb}); the lunar coordinate time of Lu,
 * Yang and Xie (2025, arXiv 2506.19213, "Lunar Time Ephemeris LTE440"); TL - TT of Turyshev,
 * Williams, Boggs and Park (2024, arXiv 2406.16147). The published lunar values are as quoted
 * in issue 17 and in the papers' abstracts (the papers themselves were not at hand).
 */
class TimeScaleRelationsTest {
  private static final double DAY_S = 86_400.0;

  @Test
  void sofaWorkedExampleConfirmsHowDtdbIsCalled() {
    // IAU SOFA test suite (t_dtdb; /work/shared/REFERENCE-VALUES.md): dtdb(2448939.5, 0.123,
    // 0.76543, 5.0123, 5525.242, 3190.0) = -0.1280368005936998991e-2 s.
    final double d = JSOFA.jauDtdb(2448939.5, 0.123, 0.76543, 5.0123, 5525.242, 3190.0);
    assertEquals(-0.1280368005936998991e-2, d, 1e-15);
  }

  @Test
  void tdbMinusTtAgreesWithSofaDtdbOver2000To2040() {
    final TimeScaleRelations rel = TimeRelationsFixture.get().relations;
    final double first = Math.ceil(rel.firstTdbS() / DAY_S + 0.5) * DAY_S;
    final int n = (int) Math.floor((rel.lastTdbS() - first) / DAY_S);
    final double[] t = new double[n];
    final double[] d = new double[n];
    double mean = 0;
    for (int i = 0; i < n; i++) {
      t[i] = first + i * DAY_S + 0.37 * DAY_S;
      final double days = t[i] / DAY_S;
      final double whole = Math.floor(days);
      // Geocentre: u = v = 0 (no topocentric terms), ut and elong immaterial then.
      d[i] = rel.tdbMinusTtGeocentreS(t[i]) - JSOFA.jauDtdb(2_451_545.0 + whole, days - whole, 0.0, 0.0, 0.0, 0.0);
      mean += d[i] / n;
    }
    double periodic = 0;
    for (double x : d) {
      periodic = Math.max(periodic, Math.abs(x - mean));
    }
    final HarmonicFit.Result drift = HarmonicFit.fit(t, d, 0.0, true, new double[0]);
    System.out.printf("evidence: timescale.tdb_tt_vs_sofa_constant_s = %.4e%n", mean);
    System.out.printf("evidence: timescale.tdb_tt_vs_sofa_periodic_s = %.4e%n", periodic);
    System.out.printf("evidence: timescale.tdb_tt_vs_sofa_drift = %.4e%n", drift.rate());
    // The constant: realised from 40 years of DE405 (see TimeScaleRelations), it may differ from
    // the FB convention by the FB terms of periods beyond the span, 1.69 + 0.45 + 0.43 us at most.
    assertTrue(Math.abs(mean) < 2.6e-6, "constant " + mean);
    // Measured 11.4 ns: SOFA's truncated FB series against the numerical integration.
    assertTrue(periodic < 1.2e-8, "periodic " + periodic);
    // L_B (IAU 2006 B3) makes TDB - TT drift-free; both realisations agree on it (measured -1.2e-17).
    assertTrue(Math.abs(drift.rate()) < 1e-16, "drift " + drift.rate());
  }

  @Test
  void lunarCoordinateTimeAgreesWithLuYangXie() {
    final TimeRelationsFixture f = TimeRelationsFixture.get();
    final double[] y = new double[f.t.length];
    for (int i = 0; i < y.length; i++) {
      final double tcbMinusTdb = TimeScaleRelations.tcbSinceT0S(f.t[i]) - (f.t[i] + TimeScales.J2000_MINUS_T0_S);
      y[i] = tcbMinusTdb - f.relations.tcbMinusTclS(f.t[i], Centre.MOON);
    }
    final HarmonicFit.Result fit = f.fitWithRate(y);
    final double rate = fit.rate() - 6.798355238e-10;
    final double annual = fit.amplitude(Frequencies.ANNUAL) - 1651e-6;
    final double monthly = fit.amplitude(Frequencies.SYNODIC_MONTH) - 126e-6;
    System.out.printf("evidence: lunar.tcl_tdb_rate_minus_lu = %.4e%n", rate);
    System.out.printf("evidence: lunar.tcl_tdb_annual_minus_lu_s = %.4e%n", annual);
    System.out.printf("evidence: lunar.tcl_tdb_monthly_minus_lu_s = %.4e%n", monthly);
    // Lu et al.: <dTCL/dTDB> = 1 + 6.798355238e-10 along DE440; ours along DE405 over 2000-2040,
    // measured +1.01e-15. The 40-year mean against TDB carries the rates of the terms longer
    // than the span (the Earth's shows the same, TimeEphemerisTest); against TT they cancel
    // (tlMinusTtAgreesWithTuryshevEtAl: 3e-18).
    assertTrue(Math.abs(rate) < 2e-15, "rate " + rate);
    // "About 1651 us" annual: our 2000-2040 amplitude is larger by about 5 us, the size of the
    // slow change of the annual term (FB series: 102 us per millennium times t, out of phase)
    // between spans; Lu et al.'s span is not stated in the abstract.
    assertTrue(Math.abs(annual) < 1.0e-5, "annual " + annual);
    // "About 126 us" monthly: the published value's own precision (0.5 us) is the limit here.
    assertTrue(Math.abs(monthly) < 1.0e-6, "monthly " + monthly);
  }

  @Test
  void tlMinusTtAgreesWithTuryshevEtAl() {
    final TimeRelationsFixture f = TimeRelationsFixture.get();
    final double[] y = new double[f.t.length];
    for (int i = 0; i < y.length; i++) {
      y[i] = f.relations.tlMinusTtSelenocentreS(f.t[i]);
    }
    final HarmonicFit.Result fit = f.fitWithRate(y);
    final double ll = f.relations.lunar().scaleRateL();
    final double driftNsPerDay = (fit.rate() * DAY_S - 56.0256e-6) * 1e9;
    final double anomalistic = fit.amplitude(Frequencies.ANOMALISTIC_MONTH) - 0.470e-6;
    final double tclTt = (1.0 + fit.rate()) / (1.0 - ll) - 1.0;
    final double impliedL = 1.0 - (1.0 + 56.0256e-6 / DAY_S) / (1.0 + tclTt);
    System.out.printf("evidence: lunar.tl_tt_drift_us_per_day = %.6f%n", fit.rate() * DAY_S * 1e6);
    System.out.printf("evidence: lunar.tl_tt_drift_minus_turyshev_ns_per_day = %.4f%n", driftNsPerDay);
    System.out.printf("evidence: lunar.tl_tt_anomalistic_amplitude_us = %.5f%n", fit.amplitude(Frequencies.ANOMALISTIC_MONTH) * 1e6);
    System.out.printf("evidence: lunar.tl_tt_anomalistic_minus_turyshev_s = %.4e%n", anomalistic);
    System.out.printf("evidence: lunar.tcl_tt_rate_minus_lu = %.4e%n", tclTt - 6.798355238e-10);
    System.out.printf("evidence: lunar.turyshev_implied_l_l = %.6e%n", impliedL);
    // Turyshev et al.: 56.0256 us/day. Ours differs by the choice of L_L (theirs is not quoted;
    // the implied one, printed above, is 1.2e-14 below our default): measured -0.99 ns/day.
    assertTrue(Math.abs(driftNsPerDay) < 2.0, "drift " + driftNsPerDay);
    // The L_L-free part, dTCL/dTT - 1, against Lu et al.'s dTCL/dTDB - 1 (TDB - TT has no drift):
    // the Earth's and the Moon's long-period terms cancel here; measured -2.6e-18, which also
    // bounds the DE405 - DE440 difference of this rate.
    assertTrue(Math.abs(tclTt - 6.798355238e-10) < 2.5e-17, "dTCL/dTT " + tclTt);
    // Largest periodic term, about 0.470 us at the anomalistic month: measured +0.96 ns.
    assertTrue(Math.abs(anomalistic) < 2.0e-9, "anomalistic " + anomalistic);
    assertEquals(fit.rate(), f.relations.tlMinusTtMeanRate(), 1e-18);
  }
}
