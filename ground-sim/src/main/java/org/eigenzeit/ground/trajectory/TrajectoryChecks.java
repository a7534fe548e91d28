package org.eigenzeit.ground.trajectory;

import java.util.Locale;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.body.CentralBody;

/**
 * Physical plausibility of orbit states, applied before any integration so that a state inside
 * the body, faster than light, far above escape speed, or a trajectory whose energy jumps between
 * samples is refused with its file and line (or its command-line option or scenario key) instead
 * of producing a garbage result or a library failure.
 *
 * <ul>
 *   <li>Radius: within the body's validation range {@code [minRadiusM, maxRadiusM]} of {@link
 *       CentralBody} (Earth: 6348 km to 2e6 km; Moon: 1725 km to 66 000 km).
 *   <li>Speed: below c, and at most {@link #ESCAPE_MARGIN} times the escape speed sqrt(2 GM / r)
 *       (a bound orbit is below 1; the margin admits slightly hyperbolic arcs and noisy samples).
 *   <li>Energy between consecutive samples: the specific energy with the J2 term, E = v^2/2 - GM/r
 *       (1 - J2 (R/r)^2 P2(z/r)) (the zonal degree-2 term of the geopotential, Montenbruck and Gill
 *       2000, "Satellite Orbits", eq. 3.27; common practice), is constant for an axisymmetric field; the
 *       neglected terms (higher harmonics, the pole's offset from the inertial z axis, Sun and Moon,
 *       drag over one sample step) change it by about 1e-5 of GM/r or less. A change above {@link
 *       #ENERGY_STEP_TOLERANCE} of GM/r (a 50 km position jump is 1e-3 in GEO, 7e-3 in LEO; a
 *       1 m/s velocity error 1.3e-4 in LEO) is refused; a manoeuvre belongs at a segment boundary.
 *   <li>Smoothness of position-only samples (SP3): each position is predicted by Lagrange
 *       interpolation through its {@link ExternalTrajectory#NODES} nearest neighbours, itself left
 *       out; a prediction error above {@link #SMOOTHNESS_TOLERANCE} of the radius names that sample.
 * </ul>
 *
 * <p>Stateless; thread-safe.
 */
public final class TrajectoryChecks {
  /** Largest allowed speed as a multiple of the escape speed at the sample's radius. */
  public static final double ESCAPE_MARGIN = 1.05;
  /** Largest allowed change of the J2 specific energy between consecutive samples, of GM/r. */
  public static final double ENERGY_STEP_TOLERANCE = 1e-4;
  /** Largest allowed leave-one-out prediction error of a position-only sample, of its radius. */
  public static final double SMOOTHNESS_TOLERANCE = 1e-4;
  private static final double C_M_PER_S = 299_792_458.0;

  private TrajectoryChecks() {}

  /**
   * Checks one inertial (or body-fixed, for the radius) state.
   *
   * @param source file name, command-line option or scenario key, for messages
   * @param line 1-based line of the sample (0 when none applies)
   * @param body central body
   * @param rM position, m
   * @param vMPerS velocity, m/s (inertial)
   * @throws InputException when not finite, inside or too far from the body, or too fast
   */
  public static void checkState(String source, int line, CentralBody body, double[] rM, double[] vMPerS) {
    for (int c = 0; c < 3; c++) {
      if (!Double.isFinite(rM[c]) || !Double.isFinite(vMPerS[c])) {
        throw new InputException(source, line, "state not finite, found " + vector(rM) + " m, " + vector(vMPerS)
            + " m/s");
      }
    }
    final double r = norm(rM);
    final double v = norm(vMPerS);
    if (r < body.minRadiusM()) {
      throw new InputException(source, line, String.format(Locale.ROOT, "position inside the %s, found radius "
          + "%.3f km, allowed %.0f to %.0f km", body.name(), r / 1e3, body.minRadiusM() / 1e3, body.maxRadiusM() / 1e3));
    }
    if (r > body.maxRadiusM()) {
      throw new InputException(source, line, String.format(Locale.ROOT, "position too far from the %s for an "
          + "orbit about it, found radius %.0f km, allowed %.0f to %.0f km", body.name(), r / 1e3,
          body.minRadiusM() / 1e3, body.maxRadiusM() / 1e3));
    }
    if (v >= C_M_PER_S) {
      throw new InputException(source, line, String.format(Locale.ROOT, "speed %.6g km/s is not below the speed "
          + "of light", v / 1e3));
    }
    final double escape = Math.sqrt(2 * body.gmM3PerS2() / r);
    if (v > ESCAPE_MARGIN * escape) {
      throw new InputException(source, line, String.format(Locale.ROOT, "speed above escape speed, found %.4f "
          + "km/s at radius %.0f km, allowed up to %.2f x %.4f km/s", v / 1e3, r / 1e3, ESCAPE_MARGIN, escape / 1e3));
    }
  }

  /**
   * The specific orbital energy with the J2 term, axis along z.
   *
   * @param body central body
   * @param rM inertial position, m
   * @param vMPerS inertial velocity, m/s
   * @return E, m^2/s^2
   */
  public static double energyJ2(CentralBody body, double[] rM, double[] vMPerS) {
    final double r = norm(rM);
    final double s = rM[2] / r;
    final double q = body.referenceRadiusM() / r;
    final double p2 = 1.5 * s * s - 0.5;
    final double v2 = vMPerS[0] * vMPerS[0] + vMPerS[1] * vMPerS[1] + vMPerS[2] * vMPerS[2];
    return 0.5 * v2 - body.gmM3PerS2() / r * (1 - body.j2() * q * q * p2);
  }

  /**
   * The relative energy change between two states, in units of GM/r at the first.
   *
   * @param body central body
   * @param r1 first position, m
   * @param v1 first velocity, m/s
   * @param r2 second position, m
   * @param v2 second velocity, m/s
   * @return |E2 - E1| / (GM / |r1|)
   */
  public static double energyStep(CentralBody body, double[] r1, double[] v1, double[] r2, double[] v2) {
    return Math.abs(energyJ2(body, r2, v2) - energyJ2(body, r1, v1)) / (body.gmM3PerS2() / norm(r1));
  }

  /**
   * Checks the energy change between consecutive samples.
   *
   * @param source file name for messages
   * @param lines line of each sample
   * @param body central body
   * @param r inertial positions [sample][3], m
   * @param v inertial velocities [sample][3], m/s
   * @return the largest relative change found (below the tolerance)
   * @throws InputException naming the later sample's line when a change exceeds the tolerance
   */
  public static double checkEnergySteps(String source, int[] lines, CentralBody body, double[][] r, double[][] v) {
    double worst = 0;
    for (int k = 1; k < r.length; k++) {
      final double step = energyStep(body, r[k - 1], v[k - 1], r[k], v[k]);
      if (step > ENERGY_STEP_TOLERANCE) {
        throw new InputException(source, lines[k], String.format(Locale.ROOT, "orbital energy changes by %.3g of "
            + "GM/r since the sample of line %d, allowed up to %.0e (a position or velocity jump, or a manoeuvre "
            + "inside a segment)", step, lines[k - 1], ENERGY_STEP_TOLERANCE));
      }
      worst = Math.max(worst, step);
    }
    return worst;
  }

  /**
   * Checks that each position agrees with the Lagrange interpolation of its neighbours. Each
   * sample is predicted from the {@link ExternalTrajectory#NODES} samples nearest to it (itself
   * left out). A jump in one sample also spoils the predictions of its neighbours, so the sample
   * named is the one whose removal makes every other prediction agree (for a single bad sample,
   * that sample); when no single removal does, the worst sample is named.
   *
   * @param source file name for messages
   * @param lines line of each sample
   * @param t sample times, s, increasing
   * @param pos positions [axis][sample], m
   * @return the largest relative prediction error found (below the tolerance)
   * @throws InputException naming the sample's line when its error exceeds the tolerance
   */
  public static double checkSmoothness(String source, int[] lines, double[] t, double[][] pos) {
    final int n = t.length;
    if (n < ExternalTrajectory.NODES + 1) {
      return 0;
    }
    final double[] err = smoothnessErrors(t, pos, -1);
    int worst = 0;
    for (int k = 1; k < n; k++) {
      if (err[k] > err[worst]) {
        worst = k;
      }
    }
    if (err[worst] <= SMOOTHNESS_TOLERANCE) {
      return err[worst];
    }
    final Integer[] order = new Integer[n];
    for (int k = 0; k < n; k++) {
      order[k] = k;
    }
    java.util.Arrays.sort(order, (a, b) -> Double.compare(err[b], err[a]));
    int culprit = worst;
    for (int c = 0; c < n && err[order[c]] > SMOOTHNESS_TOLERANCE; c++) {
      final double[] without = smoothnessErrors(t, pos, order[c]);
      boolean clean = true;
      for (int k = 0; k < n && clean; k++) {
        clean = k == order[c] || without[k] <= SMOOTHNESS_TOLERANCE;
      }
      if (clean) {
        culprit = order[c];
        break;
      }
    }
    final double radius = Math.sqrt(pos[0][culprit] * pos[0][culprit] + pos[1][culprit] * pos[1][culprit]
        + pos[2][culprit] * pos[2][culprit]);
    throw new InputException(source, lines[culprit], String.format(Locale.ROOT, "position %.3f km away from the "
        + "interpolation of its %d nearest neighbours, allowed up to %.0e of the radius (%.3f km): a position jump",
        err[culprit] * radius / 1e3, ExternalTrajectory.NODES, SMOOTHNESS_TOLERANCE, SMOOTHNESS_TOLERANCE * radius / 1e3));
  }

  /** Relative leave-one-out errors of every sample, never using sample {@code excluded} as a node. */
  private static double[] smoothnessErrors(double[] t, double[][] pos, int excluded) {
    final int n = t.length;
    final int nodes = ExternalTrajectory.NODES;
    final double[] xs = new double[nodes];
    final double[] ys = new double[nodes];
    final int[] idx = new int[nodes];
    final double[] err = new double[n];
    for (int k = 0; k < n; k++) {
      if (k == excluded) {
        continue;
      }
      int m = 0;
      for (int d = 1; m < nodes && d < n; d++) {
        for (int j : new int[] {k - d, k + d}) {
          if (m < nodes && j >= 0 && j < n && j != excluded) {
            idx[m++] = j;
          }
        }
      }
      java.util.Arrays.sort(idx, 0, m);
      double err2 = 0;
      double r2 = 0;
      for (int c = 0; c < 3; c++) {
        for (int j = 0; j < m; j++) {
          xs[j] = t[idx[j]];
          ys[j] = pos[c][idx[j]];
        }
        final double d = Lagrange.valueAndDerivative(xs, ys, 0, m, t[k])[0] - pos[c][k];
        err2 += d * d;
        r2 += pos[c][k] * pos[c][k];
      }
      err[k] = Math.sqrt(err2 / r2);
    }
    return err;
  }

  private static double norm(double[] a) {
    return Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
  }

  private static String vector(double[] a) {
    return "(" + a[0] + ", " + a[1] + ", " + a[2] + ")";
  }
}
