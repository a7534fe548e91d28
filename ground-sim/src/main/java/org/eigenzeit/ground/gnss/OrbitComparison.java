package org.eigenzeit.ground.gnss;

import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.onboard.relativity.ClosedForms;

/**
 * What an orbit error does to the relativistic correction, on real orbits: an orbit product taken
 * as an onboard orbit estimate (for example the IGS ultra-rapid prediction) against a precise
 * orbit of the same day (the IGS final), per satellite over their common epochs: the 3D position
 * difference, the difference of -2 r.v/c^2 and of Kouba's J2 term computed from each, and the
 * difference of the secular rate over the common stretch ({@link ClockRateAlong#secular}). The
 * offset error such an estimate causes grows as the secular-rate difference times the time, plus
 * the periodic-term difference at each instant. Stateless.
 */
public final class OrbitComparison {
  /** One satellite. */
  public record Satellite(String id, int epochs, int predictedEpochs, double rmsPositionM, double maxPositionM,
      double rmsTermS, double maxTermS, double maxJ2DifferenceS, double referenceSecularRate,
      double estimateSecularRate, double secularSpanS, String exclusion) {
    /** @return estimate minus reference secular rate */
    public double secularDifference() {
      return estimateSecularRate - referenceSecularRate;
    }

    /** @return the secular-rate difference as nanoseconds per day */
    public double secularDifferenceNsPerDay() {
      return secularDifference() * 86_400e9;
    }
  }

  private OrbitComparison() {}

  /**
   * Compares two orbit products on the reference's grid.
   *
   * @param reference the precise orbit
   * @param estimate the orbit taken as the estimate
   * @param stepS epoch step, s (0: the reference's interval)
   * @param ut1MinusUtcS UT1 - UTC, s
   * @return one row per satellite of either file
   */
  public static List<Satellite> compare(PreciseOrbit reference, PreciseOrbit estimate, double stepS, double ut1MinusUtcS) {
    final double step = stepS > 0 ? stepS : reference.header().intervalS();
    final List<Double> grid = new ArrayList<>();
    for (int k = 0; reference.firstGpsS() + k * step <= reference.lastGpsS() + 1e-6; k++) {
      grid.add(reference.firstGpsS() + k * step);
    }
    final ClockRateAlong clock = new ClockRateAlong(reference.firstGpsS(), ut1MinusUtcS);
    final java.util.Set<String> ids = new java.util.LinkedHashSet<>(reference.satellites());
    ids.addAll(estimate.satellites());
    final List<Satellite> out = new ArrayList<>();
    for (String id : ids) {
      out.add(satellite(reference, estimate, id, grid, clock));
    }
    return out;
  }

  private static Satellite satellite(PreciseOrbit ref, PreciseOrbit est, String id, List<Double> grid,
      ClockRateAlong clock) {
    final double[] r1 = new double[3];
    final double[] v1 = new double[3];
    final double[] r2 = new double[3];
    final double[] v2 = new double[3];
    final TermSurvey.Stats pos = new TermSurvey.Stats();
    final TermSurvey.Stats term = new TermSurvey.Stats();
    final TermSurvey.Stats j2 = new TermSurvey.Stats();
    int predicted = 0;
    String why = null;
    for (double t : grid) {
      final String a = ref.state(id, t, r1, v1);
      final String b = a == null ? est.state(id, t, r2, v2) : a;
      if (a != null || b != null) {
        if (why == null || why.startsWith(PreciseOrbit.END_OF_DATA)) {
          why = a != null ? a : b;
        }
        continue;
      }
      pos.add(Math.sqrt(sq(r2[0] - r1[0]) + sq(r2[1] - r1[1]) + sq(r2[2] - r1[2])));
      term.add(ClosedForms.eccentricityTermFromStateS(r2, v2) - ClosedForms.eccentricityTermFromStateS(r1, v1));
      j2.add(TermSurvey.j2Term(r2, v2) - TermSurvey.j2Term(r1, v1));
      if (est.predicted(id, t)) {
        predicted++;
      }
    }
    if (pos.n == 0) {
      return new Satellite(id, 0, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
          0, "no common epoch: " + why);
    }
    final int[] run = ClockRateAlong.longestRun(List.of(ref, est), id, grid);
    double sRef = Double.NaN;
    double sEst = Double.NaN;
    double span = 0;
    if (run[1] >= 2) {
      final double[] nodes = TermSurvey.nodes(grid, run);
      sRef = clock.secular(ref, id, nodes);
      sEst = clock.secular(est, id, nodes);
      span = nodes[nodes.length - 1] - nodes[0];
    }
    return new Satellite(id, pos.n, predicted, pos.rms(), pos.max(), term.rms(), term.max(), j2.max(), sRef, sEst, span,
        null);
  }

  private static double sq(double x) {
    return x * x;
  }
}
