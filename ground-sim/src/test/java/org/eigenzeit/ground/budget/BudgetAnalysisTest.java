package org.eigenzeit.ground.budget;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.junit.jupiter.api.Test;

/**
 * The budget of a GPS-like orbit (a = 26 561.75 km, e = 0.01, i = 55 deg, one day) against
 * IS-GPS-200: the mean rate is the relativistic frequency offset +4.4647e-10 (38.575 us/day,
 * section 3.3.1.1; the full reference adds J2, tides and higher harmonics, a few 1e-14), and the
 * periodic part is the eccentricity term F e sqrt(A) sin E (section 20.3.3.3.3.1), peak to peak
 * 2 |F| e sqrt(A) = 45.8 ns (plus the 0.14 ns J2 periodic term, Kouba 2004). Ashby (2003) for
 * the split of the mean rate into velocity (-7.2 us/day) and gravitational (+45.7 us/day) parts.
 */
class BudgetAnalysisTest {
  @Test
  void gpsOrbitBudgetAgainstIsGps200() {
    final OrbitSpec orbit = OrbitSpec.fromElements(CentralBody.EARTH, 2.656175e7, 0.01, 55.0, 30.0, 40.0, 0.0);
    final BudgetResult r = BudgetAnalysis.analyse("gps", orbit, Epochs.parse("2026-10-01T00:00:00", "TT"), 86_400, 10.0, 8);
    final double f = -2 * Math.sqrt(3.986005e14) / (299_792_458.0 * 299_792_458.0); // IS-GPS-200 F
    final double p2p = 2 * Math.abs(f) * 0.01 * Math.sqrt(2.656175e7);
    final double rateUsDay = r.referenceMeanRate() * 86_400 * 1e6;
    final double rateErr = Math.abs(rateUsDay - 38.575);
    final double coreRateErr = Math.abs(r.coreMeanRate() * 86_400 * 1e6 - 38.575);
    final double p2pErr = Math.max(Math.abs(r.referencePeriodicPeakToPeakS() - p2p), Math.abs(r.corePeriodicPeakToPeakS() - p2p));
    final BudgetResult.Components c = r.components();
    final double ashby = Math.max(Math.max(Math.abs(c.kinematicReference() * 86_400e6 + 7.2),
        Math.abs(c.kinematicCore() * 86_400e6 + 7.2)), Math.max(Math.abs(c.gravitationalReference() * 86_400e6 - 45.7),
        Math.abs(c.gravitationalCore() * 86_400e6 - 45.7)));
    System.out.printf("GPS budget: mean %.5f us/day (core %.5f), periodic p-p %.3f ns (core %.3f, IS-GPS-200 %.3f), "
        + "Ashby split off by %.3f us/day%n", rateUsDay, r.coreMeanRate() * 86_400e6, r.referencePeriodicPeakToPeakS() * 1e9,
        r.corePeriodicPeakToPeakS() * 1e9, p2p * 1e9, ashby);
    System.out.printf("evidence: budget.gps_rate_vs_isgps200_us_per_day = %.3e bound %.1e%n", Math.max(rateErr, coreRateErr),
        RATE_BOUND_US_PER_DAY);
    System.out.printf("evidence: budget.gps_periodic_p2p_vs_isgps200_ns = %.3e bound %.1e%n", p2pErr * 1e9, P2P_BOUND_NS);
    assertTrue(rateErr < RATE_BOUND_US_PER_DAY && coreRateErr < RATE_BOUND_US_PER_DAY, rateErr + " " + coreRateErr);
    assertTrue(p2pErr * 1e9 < P2P_BOUND_NS, "peak to peak off by " + p2pErr * 1e9 + " ns");
    assertTrue(ashby < 0.1, "Ashby's split (published to 0.1 us/day): " + ashby);
    assertTrue(Math.abs(r.coreMinusReferenceRate() - (r.coreMeanRate() - r.referenceMeanRate())) == 0.0);
  }

  /**
   * Bound on the mean rate against IS-GPS-200's 38.575 us/day (measured 7.9e-4): the published
   * figure's last digit (4.4647e-10, i.e. +-0.0004 us/day) plus the J2, tide and harmonic terms the
   * closed form leaves out (a few 1e-14, up to about 0.003 us/day).
   */
  private static final double RATE_BOUND_US_PER_DAY = 3e-3;
  /**
   * Bound on the periodic peak to peak against 2 |F| e sqrt(A) (measured 0.51 ns: the J2 periodic
   * term, 0.14 ns, and J2's short-periodic change of the osculating e and a, about 0.3 ns).
   */
  private static final double P2P_BOUND_NS = 1.0;
}
