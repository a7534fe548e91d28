package org.eigenzeit.ground.gnss;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ClosedForms;

/**
 * The per-satellite, per-epoch survey of the relativistic clock terms of real satellites.
 *
 * <p>At each epoch, from the orbit source (the precise orbit when given, otherwise the broadcast
 * orbits of the accepted records):
 *
 * <ul>
 *   <li><b>-2 r.v/c^2</b> (IS-GPS-200 section 20.3.3.3.3.1). <i>Earth rotation:</i> SP3 and
 *       broadcast orbits are Earth-fixed (ITRF, WGS 84, PZ-90); the inertial velocity is
 *       v_I = R(v_E + w x r_E) and r_I = R r_E for the rotation R to the GCRS, and since
 *       r_E . (w x r_E) = 0 and R preserves dot products, r_I . v_I = r_E . v_E exactly: the
 *       term needs no Earth orientation at all;
 *   <li>the broadcast <b>F e sqrt(A) sin E_k</b> of the record serving the epoch (GPS, QZSS;
 *       GLONASS broadcasts none), their <b>difference</b>, and -2 r.v/c^2 of the broadcast
 *       orbit itself, which splits the difference into the orbit part (precise against broadcast
 *       orbit) and what the formula omits ({@link KeplerRecord#formulaOmissionBoundS});
 *   <li>Kouba's <b>J2 periodic term</b> -(3/2) J2 (a_E^2/(a c^2)) sqrt(GM/a) sin^2 i sin 2u
 *       (Kouba 2004, GPS Solutions 8:170, eq. 13; {@link ClosedForms#j2PeriodicTermS}), the part
 *       of the clock's periodic relativistic offset that -2 r.v/c^2 leaves, with a, i and u
 *       osculating about the ITRF z axis (the Earth's figure axis that J2 refers to, within the
 *       polar motion) from r_E and v_E + w x r_E (w = 7.2921151467e-5 rad/s about z);
 *   <li>the clock rate <b>y</b> = -(v^2/2 + U - W0)/c^2 of the ground reference (EGM96 degree 36,
 *       DE405 Sun and Moon) at the inertial state (rotation by the onboard EarthOrientation with
 *       the given UT1 - UTC; an error of UT1 changes y below 1e-20, since the same rotation is
 *       undone for the geopotential), and its smooth part g = y + (2/c^2) d(r.v)/dt.
 * </ul>
 *
 * <p>Per satellite: the <b>secular rate</b>, the mean of g over the longest stretch of served
 * epochs, computed exactly as [integral of y dt + (2/c^2)(r.v(end) - r.v(start))]/span (y by
 * composite Simpson on at most 60 s steps), which removes the eccentricity term whatever the span;
 * RMS and maximum of the differences; the exclusions with their reasons. Not thread-safe.
 */
public final class TermSurvey {
  /** Speed of light squared. */
  static final double C2 = CentralBody.C2;
  /** Earth rotation rate used for the inertial velocity, rad/s (WGS 84, IERS 2010). */
  public static final double OMEGA_E = 7.2921151467e-5;

  /** One satellite at one epoch (NaN where a figure does not apply). */
  public record Row(String id, double gpsS, String orbitSource, double orbitTermS, double broadcastTermS,
      double differenceS, double broadcastOrbitTermS, double orbitPartS, double formulaBoundS, double j2TermS,
      double rate, double smoothRate, String record, double clockS, boolean predicted) {
    /** @return GPS week */
    public int gpsWeek() {
      return GnssTimeSystem.gpsWeek(gpsS);
    }

    /** @return GPS seconds of week */
    public double secondsOfWeek() {
      return GnssTimeSystem.secondsOfWeek(gpsS);
    }

    /** @return GPS calendar reading */
    public String gpsTime() {
      return GnssTimeSystem.gpsCalendar(gpsS);
    }
  }

  /** One satellite's summary. */
  public record Satellite(String id, String system, int epochs, int compared, double rmsDifferenceS,
      double maxDifferenceS, double rmsOrbitPartS, double maxOrbitPartS, double rmsFormulaBoundS,
      double maxFormulaBoundS, double maxJ2TermS, double secularRate, double secularSpanS, double rmsModelResidualS,
      double maxModelResidualS, double rmsResidualWithoutJ2S, double maxResidualWithoutJ2S, double orbitBoundS,
      double eccentricity,
      int recordsAccepted, int recordsRepeated, int recordsRejected, String exclusion, List<String> notes) {
    /** Defensive copy. */
    public Satellite {
      notes = List.copyOf(notes);
    }

    /** @return the secular rate as microseconds per day */
    public double secularMicrosecondsPerDay() {
      return secularRate * 86_400e6;
    }
  }

  /** The survey. */
  public record Result(String orbitSource, List<String> navigationFiles, List<String> clockFiles, double firstGpsS,
      double lastGpsS, List<Row> rows, List<Satellite> satellites, List<BroadcastCheck.Verdict> verdicts,
      List<String> fileNotes) {
    /** Defensive copies. */
    public Result {
      fileNotes = List.copyOf(fileNotes);
      navigationFiles = List.copyOf(navigationFiles);
      clockFiles = List.copyOf(clockFiles);
      rows = List.copyOf(rows);
      satellites = List.copyOf(satellites);
      verdicts = List.copyOf(verdicts);
    }
  }

  private final PreciseOrbit precise;
  private final List<NavFile> nav;
  private final List<ClockFile> clocks;
  private final double stepS;
  private final double ut1MinusUtcS;

  /**
   * Configures a survey.
   *
   * @param precise the precise orbit, or null (then the broadcast orbits serve)
   * @param nav navigation files (may be empty)
   * @param clocks clock files (may be empty)
   * @param stepS epoch step, s (0: the precise orbit's interval, or 900 s)
   * @param ut1MinusUtcS UT1 - UTC, s (for the inertial rotation of the clock rate only)
   */
  public TermSurvey(PreciseOrbit precise, List<NavFile> nav, List<ClockFile> clocks, double stepS, double ut1MinusUtcS) {
    if (precise == null && nav.isEmpty()) {
      throw new IllegalArgumentException("a precise orbit file or at least one navigation file is needed");
    }
    this.precise = precise;
    this.nav = List.copyOf(nav);
    this.clocks = List.copyOf(clocks);
    this.stepS = stepS > 0 ? stepS : precise != null ? precise.header().intervalS() : 900.0;
    this.ut1MinusUtcS = ut1MinusUtcS;
  }

  /**
   * Runs the survey.
   *
   * @return the result
   */
  public Result run() {
    final List<BroadcastCheck.Verdict> verdicts = BroadcastCheck.check(nav, precise);
    final BroadcastOrbit broadcast = new BroadcastOrbit(String.join(", ", nav.stream().map(NavFile::name).toList()),
        verdicts);
    final OrbitSource orbit = precise != null ? precise : broadcast;
    final double[] span = span(verdicts);
    final List<Double> grid = new ArrayList<>();
    final double first = Math.ceil(span[0] / stepS - 1e-9) * stepS;
    for (int k = 0; first + k * stepS <= span[1] + 1e-6; k++) {
      grid.add(first + k * stepS);
    }
    final Set<String> ids = new LinkedHashSet<>(orbit.satellites());
    verdicts.forEach(v -> ids.add(v.id()));
    clocks.forEach(c -> ids.addAll(c.satellites()));
    final Context ctx = new Context(orbit, broadcast, new ClockRateAlong(first, ut1MinusUtcS));
    final List<Row> rows = new ArrayList<>();
    final List<Satellite> sats = new ArrayList<>();
    for (String id : ids) {
      sats.add(satellite(ctx, id, grid, verdicts, rows));
    }
    return new Result(orbit.describe(), nav.stream().map(NavFile::name).toList(),
        clocks.stream().map(ClockFile::name).toList(), grid.isEmpty() ? first : grid.get(0),
        grid.isEmpty() ? first : grid.get(grid.size() - 1), rows, sats, verdicts, fileNotes());
  }

  private List<String> fileNotes() {
    final List<String> notes = new ArrayList<>(precise == null ? List.of() : precise.header().warnings());
    for (NavFile f : nav) {
      if (f.leapSecondsNote() != null) {
        notes.add(f.leapSecondsNote());
      }
    }
    return notes;
  }

  private double[] span(List<BroadcastCheck.Verdict> verdicts) {
    if (precise != null) {
      return new double[] {precise.firstGpsS(), precise.lastGpsS()};
    }
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (BroadcastCheck.Verdict v : verdicts) {
      lo = Math.min(lo, v.referenceGpsS());
      hi = Math.max(hi, v.referenceGpsS());
    }
    return new double[] {lo, hi};
  }

  /** What every epoch of a run needs. */
  private record Context(OrbitSource orbit, BroadcastOrbit broadcast, ClockRateAlong clock) {
    double rate(double gpsS, double[] rE, double[] vE) {
      return clock.rate(gpsS, rE, vE);
    }
  }

  private Satellite satellite(Context ctx, String id, List<Double> grid, List<BroadcastCheck.Verdict> verdicts,
      List<Row> rows) {
    final Constellation sys = Constellation.of(id.charAt(0), id, 0);
    final List<String> notes = new ArrayList<>();
    int accepted = 0;
    int repeated = 0;
    int rejected = 0;
    double eSum = 0;
    for (BroadcastCheck.Verdict v : verdicts) {
      if (v.id().equals(id)) {
        switch (v.outcome()) {
          case ACCEPTED -> {
            accepted++;
            eSum += v.kepler() != null ? v.kepler().get(KeplerRecord.E) : Double.NaN;
          }
          case REPEAT -> repeated++;
          default -> rejected++;
        }
      }
    }
    if (precise != null && precise.satellites().contains(id) && !precise.hasClock(id)) {
      notes.add("no clock in " + precise.name() + " (999999.999999 at every epoch)");
    }
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] rb = new double[3];
    final double[] vb = new double[3];
    final Stats diff = new Stats();
    final Stats orbitPart = new Stats();
    final Stats bound = new Stats();
    double maxJ2 = 0;
    double maxOrbitBound = 0;
    int served = 0;
    int noRecord = 0;
    int predictedCount = 0;
    String firstNoRecord = null;
    String firstUnserved = null;
    int unserved = 0;
    for (double t : grid) {
      final String why = ctx.orbit.state(id, t, r, v);
      if (why != null) {
        if (!why.startsWith(PreciseOrbit.END_OF_DATA)) {
          unserved++;
        }
        if (firstUnserved == null || firstUnserved.startsWith(PreciseOrbit.END_OF_DATA)) {
          firstUnserved = why;
        }
        continue;
      }
      served++;
      final double term = ClosedForms.eccentricityTermFromStateS(r, v);
      final double j2 = j2Term(r, v);
      maxJ2 = Math.max(maxJ2, Math.abs(j2));
      maxOrbitBound = Math.max(maxOrbitBound, orbitErrorBoundS(r, v));
      final double y = ctx.rate(t, r, v);
      final double g = smoothRate(ctx, id, t, y);
      double bTerm = Double.NaN;
      double bOrbit = Double.NaN;
      double bBound = Double.NaN;
      String where = "";
      final BroadcastCheck.Verdict rec = nav.isEmpty() ? null : ctx.broadcast.select(id, t);
      if (rec != null) {
        where = rec.where();
        ctx.broadcast.state(id, t, rb, vb);
        bOrbit = ClosedForms.eccentricityTermFromStateS(rb, vb);
        if (rec.kepler() != null) {
          bTerm = rec.kepler().relativisticTermS(t);
          bBound = rec.kepler().formulaOmissionBoundS();
          diff.add(term - bTerm);
          bound.add(bBound);
        }
        if (ctx.orbit != ctx.broadcast) {
          orbitPart.add(term - bOrbit);
        }
      } else if (!nav.isEmpty() && hasRecordsOf(sys)) {
        noRecord++;
        if (firstNoRecord == null) {
          firstNoRecord = GnssTimeSystem.gpsCalendar(t) + ": " + ctx.broadcast.whyNoRecord(id, t);
        }
      }
      final boolean pred = precise != null && precise.predicted(id, t);
      if (pred) {
        predictedCount++;
      }
      rows.add(new Row(id, t, ctx.orbit == precise ? "precise" : "broadcast", term, bTerm,
          Double.isNaN(bTerm) ? Double.NaN : term - bTerm, bOrbit,
          ctx.orbit != ctx.broadcast && !Double.isNaN(bOrbit) ? term - bOrbit : Double.NaN, bBound, j2, y, g, where,
          clock(id, t), pred));
    }
    if (unserved > 0 && served > 0) {
      notes.add(unserved + " epochs without an orbit state (first: " + firstUnserved + ")");
    }
    if (noRecord > 0) {
      notes.add(noRecord + " epochs without an accepted broadcast record (first " + firstNoRecord + ")");
    }
    if (predictedCount > 0) {
      notes.add(predictedCount + " epochs rest on positions flagged predicted");
    }
    final int[] run = ClockRateAlong.longestRun(List.of(ctx.orbit), id, grid);
    final ClockRateAlong.Arc arc = run[1] < 2 ? null : ctx.clock.integrate(ctx.orbit, id, nodes(grid, run));
    final Stats model = new Stats();
    final Stats plain = new Stats();
    if (arc != null) {
      for (double x : arc.residuals(true)) {
        model.add(x);
      }
      for (double x : arc.residuals(false)) {
        plain.add(x);
      }
    }
    final double secularRate = arc == null ? Double.NaN : arc.secularRate();
    final double secularSpan = arc == null ? 0 : arc.t()[arc.t().length - 1] - arc.t()[0];
    final String exclusion = exclusion(id, sys, served, firstUnserved, diff.n, orbitPart.n, verdicts);
    return new Satellite(id, sys.name(), served, Math.max(diff.n, orbitPart.n), diff.rms(), diff.max(), orbitPart.rms(),
        orbitPart.max(), bound.rms(), bound.max(), served > 0 ? maxJ2 : Double.NaN, secularRate, secularSpan, model.rms(), model.max(), plain.rms(), plain.max(),
        served > 0 ? maxOrbitBound : Double.NaN, accepted > 0 ? eSum / accepted : Double.NaN, accepted, repeated,
        rejected, exclusion, notes);
  }

  /** The grid epochs of a run. */
  static double[] nodes(List<Double> grid, int[] run) {
    final double[] t = new double[run[1]];
    for (int k = 0; k < run[1]; k++) {
      t[k] = grid.get(run[0] + k);
    }
    return t;
  }

  /**
   * What an orbit error at the record check's threshold can do to -2 r.v/c^2:
   * 2(|v| + n r) T/c^2 with n = sqrt(GM/r^3), taking the velocity error as n times the position
   * error (errors at the orbital frequency, common practice) and T =
   * {@link BroadcastCheck#POSITION_THRESHOLD_M}.
   *
   * @param rE position, m
   * @param vE Earth-fixed velocity, m/s
   * @return the bound, s
   */
  public static double orbitErrorBoundS(double[] rE, double[] vE) {
    final double[] v = {vE[0] - OMEGA_E * rE[1], vE[1] + OMEGA_E * rE[0], vE[2]};
    final double r = Math.sqrt(dot(rE, rE));
    final double n = Math.sqrt(CentralBody.EARTH.gmM3PerS2() / (r * r * r));
    return 2.0 * (Math.sqrt(dot(v, v)) + n * r) * BroadcastCheck.POSITION_THRESHOLD_M / C2;
  }

  private boolean hasRecordsOf(Constellation sys) {
    for (NavFile f : nav) {
      if (f.system() == sys) {
        return true;
      }
    }
    return false;
  }

  private String exclusion(String id, Constellation sys, int served, String firstUnserved, int compared,
      int orbitCompared, List<BroadcastCheck.Verdict> verdicts) {
    final String none = nav.isEmpty() || !hasRecordsOf(sys) ? null : BroadcastCheck.whyNone(id, verdicts);
    if (served == 0) {
      return none != null ? none : "no orbit state: " + (firstUnserved == null ? "no epochs" : firstUnserved);
    }
    if (nav.isEmpty()) {
      return null;
    }
    if (!hasRecordsOf(sys)) {
      return "no " + sys + " navigation file given: terms from the orbit only";
    }
    if (none != null) {
      return none;
    }
    if (compared == 0 && orbitCompared == 0 && precise != null) {
      return "no epoch with both an orbit state and an accepted record within its fit interval";
    }
    return null;
  }

  private double clock(String id, double t) {
    for (ClockFile c : clocks) {
      for (ClockFile.Sample s : c.samples(id)) {
        if (Math.abs(s.gpsS() - t) < 1e-3) {
          return s.biasS();
        }
      }
    }
    return precise != null ? precise.clockS(id, t) : Double.NaN;
  }

  /** g = y + (2/c^2) d(r.v)/dt, the derivative by a central difference over +-30 s (NaN at the edges). */
  private static double smoothRate(Context ctx, String id, double t, double y) {
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double h = 30.0;
    if (ctx.orbit.state(id, t + h, r, v) != null) {
      return Double.NaN;
    }
    final double up = dot(r, v);
    if (ctx.orbit.state(id, t - h, r, v) != null) {
      return Double.NaN;
    }
    final double down = dot(r, v);
    return y + 2.0 / C2 * (up - down) / (2 * h);
  }

  /**
   * Kouba's J2 term from an Earth-fixed state: osculating a, i, u about the ITRF z axis with the
   * inertial velocity v_E + w x r_E.
   *
   * @param rE position, m
   * @param vE Earth-fixed velocity, m/s
   * @return the term, s
   */
  public static double j2Term(double[] rE, double[] vE) {
    final double[] v = {vE[0] - OMEGA_E * rE[1], vE[1] + OMEGA_E * rE[0], vE[2]};
    final double gm = CentralBody.EARTH.gmM3PerS2();
    final double rn = Math.sqrt(dot(rE, rE));
    final double a = 1.0 / (2.0 / rn - dot(v, v) / gm);
    final double hx = rE[1] * v[2] - rE[2] * v[1];
    final double hy = rE[2] * v[0] - rE[0] * v[2];
    final double hz = rE[0] * v[1] - rE[1] * v[0];
    final double h = Math.sqrt(hx * hx + hy * hy + hz * hz);
    final double inc = Math.acos(hz / h);
    final double node = Math.atan2(hx, -hy);
    final double u = Math.atan2(rE[2] / Math.sin(inc), rE[0] * Math.cos(node) + rE[1] * Math.sin(node));
    return ClosedForms.j2PeriodicTermS(gm, CentralBody.EARTH.j2(), CentralBody.EARTH.referenceRadiusM(), a, inc, u);
  }

  static double dot(double[] a, double[] b) {
    return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  }

  /** RMS and maximum of absolute values. */
  static final class Stats {
    int n;
    double sum2;
    double max;

    void add(double x) {
      n++;
      sum2 += x * x;
      max = Math.max(max, Math.abs(x));
    }

    double rms() {
      return n == 0 ? Double.NaN : Math.sqrt(sum2 / n);
    }

    double max() {
      return n == 0 ? Double.NaN : max;
    }
  }

  @Override
  public String toString() {
    return String.format(Locale.ROOT, "survey of %s with %d navigation and %d clock files, step %.0f s",
        precise != null ? precise.name() : "broadcast orbits", nav.size(), clocks.size(), stepS);
  }
}
