package org.eigenzeit.ground.reference;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The reference's c^-4 clock rate ({@link ReferenceConfig#withC4}) against the IAU 2000
 * Resolution B1.3 metric evaluated without expansion, in BigDecimal (50 digits) written here:
 *
 * <pre>
 *   g00 = -1 + 2w/c^2 - 2w^2/c^4,  gij = delta_ij (1 + 2w/c^2)             (IAU 2000 B1.3)
 *   dtau/dTCG = sqrt(1 - 2w/c^2 + 2w^2/c^4 - (1 + 2w/c^2) v^2/c^2)
 *   dtau/dTT  = dtau/dTCG / (1 - L_G),   L_G = 6.969290134e-10             (IAU 2000 B1.9)
 * </pre>
 *
 * The c^-4 expansion leaves O(c^-6), about 1e-27; the c^-2 form leaves the c^-4 terms, about
 * 1e-18 (so the check tells the two apart by five orders). GM of the potential is the EGM96
 * header's 3.986004415e14 m^3/s^2 (Lemoine et al. 1998), c = 299 792 458 m/s (defining).
 */
class ReferenceC4Test {
  private static final MathContext MC = new MathContext(50);
  private static final BigDecimal C = new BigDecimal("299792458");
  private static final BigDecimal C2 = C.multiply(C, MC);
  private static final BigDecimal LG = new BigDecimal("6.969290134e-10");
  private static final double GM = 3.986004415e14;
  private static final SplitTime T0 = SplitTime.of(846_000_000L, 0.0); // 2026-10-22 TT

  /** y = dtau/dTT - 1 from the unexpanded metric for potential w and inertial speed^2 v2. */
  static double metricRate(BigDecimal w, BigDecimal v2) {
    final BigDecimal wc = w.divide(C2, MC);
    final BigDecimal vc = v2.divide(C2, MC);
    final BigDecimal two = BigDecimal.valueOf(2);
    final BigDecimal inside = BigDecimal.ONE.subtract(two.multiply(wc, MC), MC)
        .add(two.multiply(wc, MC).multiply(wc, MC), MC)
        .subtract(BigDecimal.ONE.add(two.multiply(wc, MC), MC).multiply(vc, MC), MC);
    final BigDecimal dtauDtcg = inside.sqrt(MC);
    return dtauDtcg.divide(BigDecimal.ONE.subtract(LG, MC), MC).subtract(BigDecimal.ONE, MC).doubleValue();
  }

  private static BigDecimal norm2(double[] x) {
    BigDecimal s = BigDecimal.ZERO;
    for (double c : x) {
      final BigDecimal b = new BigDecimal(c);
      s = s.add(b.multiply(b, MC), MC);
    }
    return s;
  }

  /** LEO, GPS, GEO, an eccentric orbit's perigee and apogee, a lunar-distance point. */
  private static final double[][][] STATES = {
    {{6.93e6, 0, 0}, {0, 1.0e3, 7.51e3}},
    {{1.5e7, -2.1e7, 0.6e7}, {2.4e3, 1.6e3, 1.3e3}},
    {{4.2164e7, 0, 0}, {0, 3.0747e3, 0}},
    {{7.0e6, 1.0e5, -2.0e5}, {100.0, 9.2e3, 3.0e3}},
    {{-3.9e7, 1.2e7, 4.0e6}, {-0.3e3, -1.1e3, 0.4e3}},
    {{3.8e8, 0, 0}, {0, 1.0e3, 0}},
  };

  @Test
  void pointMassC4RateMatchesTheUnexpandedMetric() {
    final ReferenceConfig base = ReferenceConfig.earth(2).withDegree(0).withThirdBodies(null);
    final ReferenceRate withC4 = new ReferenceRate(base.withC4(true), T0);
    final ReferenceRate withoutC4 = new ReferenceRate(base.withC4(false), T0);
    double worst = 0;
    double worstOff = Double.POSITIVE_INFINITY;
    for (double[][] s : STATES) {
      final BigDecimal w = new BigDecimal(GM).divide(norm2(s[0]).sqrt(MC), MC);
      final double exact = metricRate(w, norm2(s[1]));
      worst = Math.max(worst, Math.abs(withC4.rate(0.0, s[0], s[1]).total() - exact));
      worstOff = Math.min(worstOff, Math.abs(withoutC4.rate(0.0, s[0], s[1]).total() - exact));
    }
    System.out.printf("c^-4 rate vs unexpanded IAU 2000 B1.3 metric, point mass: worst %.2e "
        + "(c^-2 form: at least %.2e)%n", worst, worstOff);
    System.out.printf("evidence: reference.c4_vs_metric_point_mass = %.3e%n", worst);
    assertTrue(worst < 1e-24, "c^-4 rate off the metric by " + worst); // measured 1.0e-25 (rounding)
    assertTrue(worstOff > 1e-20, "the c^-2 form should differ from the metric by its c^-4 terms");
  }

  @Test
  void fullFieldC4RateUsesTheWholePotential() {
    // Degree 20 and DE405 Sun and Moon: the metric's w is GM/r plus the harmonic and tidal
    // potentials; those two are taken from the breakdown (they do not depend on the c^-4 switch
    // and are checked on their own by CunninghamTest), the combination is what is checked here.
    final ReferenceConfig base = ReferenceConfig.earth(20).withThirdBodies(ThirdBodies.de405());
    final ReferenceRate withC4 = new ReferenceRate(base.withC4(true), T0);
    double worst = 0;
    for (double[][] s : STATES) {
      final RateBreakdown b = withC4.rate(3600.0, s[0], s[1]);
      final BigDecimal uOther = new BigDecimal(-(b.harmonics() + b.tidal())).multiply(C2, MC);
      final BigDecimal w = new BigDecimal(GM).divide(norm2(s[0]).sqrt(MC), MC).add(uOther, MC);
      worst = Math.max(worst, Math.abs(b.total() - metricRate(w, norm2(s[1]))));
    }
    System.out.printf("c^-4 rate vs unexpanded metric, degree 20 + DE405: worst %.2e%n", worst);
    System.out.printf("evidence: reference.c4_vs_metric_full_field = %.3e%n", worst);
    assertTrue(worst < 2e-24, "c^-4 rate off the metric by " + worst); // measured 2.1e-25 (rounding)
  }
}
