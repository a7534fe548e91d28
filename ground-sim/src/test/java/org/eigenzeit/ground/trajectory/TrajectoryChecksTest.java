package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.body.CentralBody;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.ode.LocalizedODEFormats;
import org.junit.jupiter.api.Test;

/**
 * Plausibility of trajectories before integration. The expected bounds are physics (escape speed
 * sqrt(2 GM/r), the speed of light, the Earth's radius; common practice); the energy and
 * smoothness figures of real orbits are measured here on the IGS final orbit of 2010-07-01.
 */
class TrajectoryChecksTest {
  private static final double GM = CentralBody.EARTH.gmM3PerS2();

  private static String refusal(double[] r, double[] v) {
    return assertThrows(InputException.class,
        () -> TrajectoryChecks.checkState("--state-km", 0, CentralBody.EARTH, r, v)).getMessage();
  }

  @Test
  void statesInsideTheBodyFasterThanLightOrAboveEscapeAreRefused() {
    final double r = 7.0e6;
    final double vc = Math.sqrt(GM / r);
    TrajectoryChecks.checkState("x", 1, CentralBody.EARTH, new double[] {r, 0, 0}, new double[] {0, vc, 0});
    assertTrue(refusal(new double[] {6.0e6, 0, 0}, new double[] {0, vc, 0})
        .startsWith("--state-km: position inside the Earth, found radius 6000.000 km, allowed 6348 to 2000000 km"));
    assertTrue(refusal(new double[] {3.0e9, 0, 0}, new double[] {0, 1, 0}).startsWith("--state-km: position too far"));
    assertTrue(refusal(new double[] {r, 0, 0}, new double[] {0, 3.0e8, 0}).contains("not below the speed of light"));
    final double escape = Math.sqrt(2 * GM / r);
    TrajectoryChecks.checkState("x", 1, CentralBody.EARTH, new double[] {r, 0, 0}, new double[] {0, 1.04 * escape, 0});
    final String fast = refusal(new double[] {r, 0, 0}, new double[] {0, 1.06 * escape, 0});
    assertEquals(String.format(Locale.ROOT, "--state-km: speed above escape speed, found %.4f km/s at radius 7000 km, "
        + "allowed up to 1.05 x %.4f km/s", 1.06 * escape / 1e3, escape / 1e3), fast);
    assertEquals(10.6718, escape / 1e3, 1e-4); // sqrt(2 GM / 7000 km)
    assertTrue(refusal(new double[] {r, Double.NaN, 0}, new double[] {0, vc, 0}).startsWith("--state-km: state not finite"));
    assertTrue(refusal(new double[] {r, 0, 0}, new double[] {0, Double.POSITIVE_INFINITY, 0}).contains("not finite"));
    final String moon = assertThrows(InputException.class, () -> TrajectoryChecks.checkState("m.oem", 4,
        CentralBody.MOON, new double[] {1.0e6, 0, 0}, new double[] {0, 1, 0})).getMessage();
    assertTrue(moon.startsWith("m.oem:4: position inside the Moon, found radius 1000.000 km"), moon);
  }

  @Test
  void theJ2EnergyIsConservedOnAJ2OrbitAndAJumpIsNot() {
    // A circular equatorial orbit is an exact J2 solution with v^2 = GM/r (1 + 1.5 J2 (R/r)^2).
    final double r = 7.0e6;
    final double q = CentralBody.EARTH.referenceRadiusM() / r;
    final double v = Math.sqrt(GM / r * (1 + 1.5 * CentralBody.EARTH.j2() * q * q));
    final double[] r1 = {r, 0, 0};
    final double[] v1 = {0, v, 0};
    final double[] r2 = {0, r, 0};
    final double[] v2 = {-v, 0, 0};
    assertEquals(0.0, TrajectoryChecks.energyStep(CentralBody.EARTH, r1, v1, r2, v2), 1e-15);
    // E = v^2/2 - GM/r (1 - J2 q^2 P2(0)) with P2(0) = -1/2.
    assertEquals(0.5 * v * v - GM / r * (1 + 0.5 * CentralBody.EARTH.j2() * q * q),
        TrajectoryChecks.energyJ2(CentralBody.EARTH, r1, v1), 1e-6);
    final double[][] rs = {r1, {0, r + 50e3, 0}};
    final double[][] vs = {v1, v2};
    final String m = assertThrows(InputException.class,
        () -> TrajectoryChecks.checkEnergySteps("t.oem", new int[] {20, 21}, CentralBody.EARTH, rs, vs)).getMessage();
    assertTrue(m.startsWith("t.oem:21: orbital energy changes by 0.00710 of GM/r"), m);
    assertTrue(m.contains("since the sample of line 20, allowed up to 1e-04"), m);
  }

  @Test
  void realOrbitsPassWithMarginAndTheFiguresArePinned() {
    final Sp3File f = Sp3File.parse("igs15904.sp3", Fixtures.sp3Lines());
    double energy = 0;
    double smooth = 0;
    for (String id : f.satelliteIds()) {
      final ExternalTrajectory tr = ExternalTrajectory.fromSp3(f, id, -66.25);
      energy = Math.max(energy, tr.worstEnergyStep());
      smooth = Math.max(smooth, tr.worstSmoothness());
    }
    System.out.printf(Locale.ROOT, "evidence: trajectory.igs_worst_energy_step = %.3e%n", energy);
    System.out.printf(Locale.ROOT, "evidence: trajectory.igs_worst_smoothness = %.3e%n", smooth);
    // Measured 9.7e-7 and 6.2e-8 (32 GPS satellites, 900 s): pinned at ten times, far below the tolerances.
    assertTrue(energy < 9.7e-6, "energy " + energy);
    assertTrue(smooth < 6.2e-7, "smoothness " + smooth);
    assertTrue(energy > 0 && smooth > 0);
  }

  @Test
  void implausibleSamplesInFilesNameTheirLine() {
    // SP3: G05 moved by 50 km at its 6th epoch (line 23 + 5 * 4 + 3 of the trimmed file).
    final List<String> sp3 = new ArrayList<>(Fixtures.sp3Trimmed(16, List.of("G02", "G05", "G07")));
    final int line = sp3.indexOf(sp3.stream().filter(l -> l.startsWith("PG05")).skip(5).findFirst().orElseThrow()) + 1;
    final String l = sp3.get(line - 1);
    final double x = Double.parseDouble(l.substring(4, 18).strip()) + 50.0;
    sp3.set(line - 1, l.substring(0, 4) + String.format(Locale.ROOT, "%14.6f", x) + l.substring(18));
    final Sp3File jumped = Sp3File.parse("j.sp3", sp3);
    final String m = assertThrows(InputException.class, () -> ExternalTrajectory.fromSp3(jumped, "G05", -66.25))
        .getMessage();
    assertTrue(m.startsWith("j.sp3:" + line + ": position 50.0"), m);
    ExternalTrajectory.fromSp3(jumped, "G07", -66.25);
    // OEM with velocities: a 50 km jump, a 10 m/s jump, a state inside the Earth, faster than light.
    startsWith("t.oem:20: orbital energy changes by", oemRefusal(20, 1, 50.0));
    startsWith("t.oem:20: orbital energy changes by", oemRefusal(20, 4, 0.01));
    startsWith("t.oem:20: position inside the Earth, found radius 3000.000", oemRefusal(20, 0, Double.NaN));
    startsWith("t.oem:20: speed 399999 km/s is not below the speed of light", oemRefusal(20, 5, 4.0e5));
    final List<String> few = new ArrayList<>(Fixtures.oem("GCRF", 9));
    assertTrue(assertThrows(InputException.class, () -> ExternalTrajectory.fromOem(OemFile.parse("t.oem", few),
        -66.25)).getMessage().startsWith("t.oem:14: segment starting here has 9 samples, allowed 10 or more"));
  }

  private static void startsWith(String prefix, String message) {
    assertTrue(message.startsWith(prefix), message);
  }

  /** The GCRF fixture with field {@code k} of ephemeris line {@code lineNo} shifted (NaN: radius 3000 km). */
  private static String oemRefusal(int lineNo, int k, double shift) {
    final List<String> l = new ArrayList<>(Fixtures.oem("GCRF", 24));
    final String[] f = l.get(lineNo - 1).split(" ");
    if (Double.isNaN(shift)) {
      f[1] = "3000.0";
      f[2] = "0.0";
      f[3] = "0.0";
    } else {
      f[1 + k] = String.format(Locale.ROOT, "%.9f", Double.parseDouble(f[1 + k]) + shift);
    }
    l.set(lineNo - 1, String.join(" ", f));
    final OemFile oem = OemFile.parse("t.oem", l);
    return assertThrows(InputException.class, () -> ExternalTrajectory.fromOem(oem, -66.25)).getMessage();
  }

  @Test
  void integrationFailuresNameTheInputWithoutTheLibraryText() {
    final MathIllegalStateException e =
        new MathIllegalStateException(LocalizedODEFormats.NAN_APPEARING_DURING_INTEGRATION, 1234.5);
    assertTrue(e.getMessage().contains("NaN"), e.getMessage());
    final String m = ExternalTrajectory.integrationFailure("t.oem", 0, e).getMessage();
    assertEquals("t.oem: the integration along this input failed near t = 1234.50 s (the state or its rate stopped "
        + "being finite or the step size collapsed), allowed only physically plausible orbits", m);
  }
}
