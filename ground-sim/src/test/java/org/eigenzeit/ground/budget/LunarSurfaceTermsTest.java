package org.eigenzeit.ground.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The surface clock's terms one by one, each against a closed form, at a resolution far below the
 * 0.005 us/day of the published total (LunarBudgetTest): the kinematic term of the Moon's rotation
 * and the gravitational term's dependence on the site's height.
 */
class LunarSurfaceTermsTest {
  private static final SplitTime EPOCH = SplitTime.of(844_128_000L - 43_200L, 0.0);
  private static final double C2 = 299_792_458.0 * 299_792_458.0;

  private static LunarSurfaceClock.Result at(double latDeg, double heightM) {
    return LunarSurfaceClock.analyse(new LunarSurfaceClock.Site(latDeg, 0, heightM), EPOCH, 86_400.0, 600.0,
        CentralBody.MOON);
  }

  @Test
  void rotationGivesTheKinematicTermAtTheEquatorAndNoneAtThePole() {
    // The Moon turns once per sidereal month, 27.321661 d (common practice; from memory), so a
    // clock on its equator moves at omega R = 4.62 m/s and runs slow by (omega R)^2 / (2 c^2) =
    // 1.19e-16. Librations change the rotation rate by well under 0.1 %.
    final double omega = 2 * Math.PI / (27.321661 * 86_400.0);
    final double v = omega * LunarSurfaceClock.MEAN_RADIUS_M;
    final double expected = -0.5 * v * v / C2;
    final LunarSurfaceClock.Result equator = at(0, 0);
    System.out.printf("evidence: lunar.surface_kinematic_equator_over_closed_form = %.5f%n", equator.kinematic() / expected);
    assertEquals(expected, equator.kinematic(), 1e-3 * Math.abs(expected)); // measured 1.3e-4
    assertTrue(Math.abs(at(90, 0).kinematic()) < 0.01 * Math.abs(expected), "pole: " + at(90, 0).kinematic());
    assertEquals(0.25 * expected, at(60, 0).kinematic(), 0.01 * Math.abs(expected), "cos^2(60 deg) = 1/4");
  }

  @Test
  void heightRaisesTheGravitationalTermByGmHOverR2() {
    // -GM / ((R + h) c^2) - (-GM / (R c^2)) = GM h / (R (R + h) c^2) for the Moon's GM (the
    // core's value, 4.9028001e12 m^3/s^2, from DE405's constants).
    final double gm = CentralBody.MOON.gmM3PerS2();
    final double r = LunarSurfaceClock.MEAN_RADIUS_M;
    final double h = 10_000.0;
    final double expected = gm * h / (r * (r + h) * C2);
    final double got = at(0, h).gravitational() - at(0, 0).gravitational();
    System.out.printf("evidence: lunar.surface_height_term_over_closed_form_minus_1 = %.3e%n", got / expected - 1);
    assertEquals(expected, got, 1e-13 * expected); // measured 1.5e-14 relative
  }
}
