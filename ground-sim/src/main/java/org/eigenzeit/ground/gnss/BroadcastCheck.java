package org.eigenzeit.ground.gnss;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;

/**
 * Validation of every broadcast record before use. Nothing is dropped silently: each record gets
 * a verdict (accepted, repeat of an accepted record, or rejected) with every reason found.
 *
 * <ol>
 *   <li><b>Values</b>: the data words are whole numbers in their ranges (IODE 0-255, IODC 0-1023,
 *       health 0-63, week, toe a multiple of 16 s within the week), eccentricity and sqrt(A) in
 *       the interface specification's ranges (IS-GPS-200 Table 20-III: e 0-0.03, sqrt(A)
 *       2530-8192 sqrt(m); QZSS: e up to 0.1 for its inclined geosynchronous orbits; from memory),
 *       toe within a week of toc; GLONASS: frequency number -7..13 (RINEX 2.11), age 0-31 days,
 *       radius above 1.05 Earth radii and speed below the local escape speed.
 *   <li><b>Health</b>: GPS health word not 0 (IS-GPS-200 20.3.3.3.1.4); QZSS the same without its
 *       lowest bit, which flags the L6 (LEX) signal, not the orbit (IS-QZSS, from memory);
 *       GLONASS health flag not 0.
 *   <li><b>Duplicates under two satellite numbers</b>: the same data, field for field, filed under
 *       another satellite (a known defect of merged broadcast files). With a precise orbit the
 *       position check below decides which copy is wrong; without one every copy is rejected,
 *       since nothing tells which satellite the data belongs to.
 *   <li><b>Position at the reference epoch</b> (toe, or t_b for GLONASS) against the precise orbit,
 *       when it covers that epoch: rejected above {@link #POSITION_THRESHOLD_M} = 30 m (3D). 30 m
 *       is the GPS SPS Performance Standard's bound on the signal-in-space range error of a healthy
 *       satellite (4th edition, 2008, Table 3.4-1, 99.94 % global average; from memory); the 3D
 *       error is never smaller than the range error, so a record within 30 m is within the
 *       standard. Healthy records sit a few metres off (the broadcast orbit refers to the antenna
 *       phase centre, the precise one to the centre of mass), a record filed under the wrong
 *       satellite thousands of kilometres. Applied to GLONASS and QZSS as common practice.
 *   <li><b>IODE</b>: IODE equal to the 8 low bits of IODC (IS-GPS-200 20.3.4.4); an IODE reused
 *       within 6 hours for another orbit (the interface specification forbids it; from memory)
 *       rejects the later record. The IODE names the orbit data set, so a record with the same
 *       IODE and orbit but a new clock (a new IODC, as QZSS sends every 15 min) is not a reuse.
 *   <li><b>Repeats</b>: a record equal to an accepted one of the same satellite (the same message
 *       received again, with another transmission time) is kept once and listed as a repeat.
 * </ol>
 *
 * <p>The fit interval is checked where a record is used ({@link BroadcastOrbit}): a record serves
 * only within toe +- half its fit interval (RINEX 2.11: hours, 0 when not known, taken as 4 h,
 * IS-GPS-200's fit interval for flag 0); a GLONASS record within t_b +- 15 min (the 30 min update
 * interval, common practice).
 */
public final class BroadcastCheck {
  /** Largest 3D distance from the precise orbit at the reference epoch, m. */
  public static final double POSITION_THRESHOLD_M = 30.0;
  /** Window within which an IODE must not be reused for other data, s. */
  public static final double IODE_REUSE_WINDOW_S = 6 * 3600.0;

  /** The outcome for a record. */
  public enum Outcome {
    /** Used. */
    ACCEPTED,
    /** Same data as an accepted record of the same satellite: kept once. */
    REPEAT,
    /** Not used. */
    REJECTED
  }

  /** The verdict on one record. */
  public static final class Verdict {
    private final KeplerRecord kepler;
    private final GlonassRecord glonass;
    private final List<String> reasons = new ArrayList<>();
    private final List<String> notes = new ArrayList<>();
    private Outcome outcome = Outcome.ACCEPTED;
    private double positionErrorM = Double.NaN;

    Verdict(KeplerRecord k, GlonassRecord g) {
      this.kepler = k;
      this.glonass = g;
    }

    /** @return the Keplerian record, or null */
    public KeplerRecord kepler() {
      return kepler;
    }

    /** @return the GLONASS record, or null */
    public GlonassRecord glonass() {
      return glonass;
    }

    /** @return satellite identifier */
    public String id() {
      return kepler != null ? kepler.id() : glonass.id();
    }

    /** @return file:line of the record */
    public String where() {
      return kepler != null ? kepler.where() : glonass.where();
    }

    /** @return reference epoch (toe or t_b), GPS seconds */
    public double referenceGpsS() {
      return kepler != null ? kepler.toeGpsS() : glonass.tbGpsS();
    }

    /** @return the outcome */
    public Outcome outcome() {
      return outcome;
    }

    /** @return why it was rejected or set aside (empty when accepted) */
    public List<String> reasons() {
      return Collections.unmodifiableList(reasons);
    }

    /** @return remarks that do not reject (e.g. not checked against a precise orbit) */
    public List<String> notes() {
      return Collections.unmodifiableList(notes);
    }

    /** @return the 3D distance from the precise orbit at the reference epoch, m (NaN when not checked) */
    public double positionErrorM() {
      return positionErrorM;
    }

    /** @return health word or flag */
    public int health() {
      return kepler != null ? kepler.health() : (int) glonass.health();
    }

    void reject(String why) {
      outcome = Outcome.REJECTED;
      reasons.add(why);
    }
  }

  private BroadcastCheck() {}

  /**
   * Judges every record of the files.
   *
   * @param files navigation files
   * @param precise the precise orbit, or null
   * @return one verdict per record, in file order
   */
  public static List<Verdict> check(List<NavFile> files, OrbitSource precise) {
    final List<Verdict> all = new ArrayList<>();
    for (NavFile f : files) {
      f.keplerRecords().forEach(k -> all.add(new Verdict(k, null)));
      f.glonassRecords().forEach(g -> all.add(new Verdict(null, g)));
    }
    for (Verdict v : all) {
      if (v.kepler != null) {
        keplerValues(v);
      } else {
        glonassValues(v);
      }
      health(v);
      position(v, precise);
    }
    duplicates(all, precise);
    iode(all);
    repeats(all);
    return all;
  }

  private static void keplerValues(Verdict v) {
    final KeplerRecord k = v.kepler;
    whole(v, "IODE", k.get(KeplerRecord.IODE), 0, 255);
    whole(v, "IODC", k.get(KeplerRecord.IODC), 0, 1023);
    whole(v, "health", k.get(KeplerRecord.HEALTH), 0, 63);
    whole(v, "GPS week", k.get(KeplerRecord.WEEK), 0, 9999);
    final double toe = k.get(KeplerRecord.TOE);
    if (!(toe >= 0 && toe < GnssTimeSystem.WEEK_S) || toe % 16 != 0) {
      v.reject(String.format(Locale.ROOT, "toe: found %.3f s, allowed a multiple of 16 s in [0, 604800)", toe));
    }
    final double eMax = k.system() == Constellation.QZSS ? 0.1 : 0.03;
    range(v, "eccentricity", k.get(KeplerRecord.E), 0, eMax);
    range(v, "sqrt(A), sqrt(m)", k.get(KeplerRecord.SQRT_A), 2530, 8192);
    range(v, "SV accuracy, m", k.get(KeplerRecord.ACCURACY), 0, 1e4);
    range(v, "fit interval, h", k.get(KeplerRecord.FIT), 0, 200);
    if (Math.abs(k.toeGpsS() - k.tocGpsS()) > GnssTimeSystem.WEEK_S / 2.0) {
      v.reject(String.format(Locale.ROOT, "toe (week %d, %.0f s) more than half a week from toc: the week number is wrong",
          (long) k.get(KeplerRecord.WEEK), toe));
    }
  }

  private static void glonassValues(Verdict v) {
    final GlonassRecord g = v.glonass;
    whole(v, "health", g.health(), 0, 7);
    whole(v, "frequency number", g.frequencyNumber(), -7, 13);
    whole(v, "age of operational information, days", g.ageDays(), 0, 31);
    final double[] r = g.positionM();
    final double[] vel = g.velocityMPerS();
    final double rn = Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]);
    final double vn = Math.sqrt(vel[0] * vel[0] + vel[1] * vel[1] + vel[2] * vel[2]);
    if (!(rn > 1.05 * 6.378136e6 && rn < 1e8)) {
      v.reject(String.format(Locale.ROOT, "radius: found %.0f km, allowed 6697 km to 100000 km", rn / 1e3));
    } else if (!(vn < Math.sqrt(2 * Constellation.GLONASS.mu() / rn))) {
      v.reject(String.format(Locale.ROOT, "speed: found %.1f m/s, allowed below the escape speed %.1f m/s", vn,
          Math.sqrt(2 * Constellation.GLONASS.mu() / rn)));
    }
  }

  private static void whole(Verdict v, String field, double x, double min, double max) {
    if (!(x >= min && x <= max) || Double.compare(x, Math.rint(x)) != 0) {
      v.reject(String.format(Locale.ROOT, "%s: found %s, allowed a whole number %d to %d", field, fmt(x), (long) min,
          (long) max));
    }
  }

  private static void range(Verdict v, String field, double x, double min, double max) {
    if (!(x >= min && x <= max)) {
      v.reject(String.format(Locale.ROOT, "%s: found %s, allowed %s to %s", field, fmt(x), fmt(min), fmt(max)));
    }
  }

  private static String fmt(double x) {
    if (Double.compare(x, Math.rint(x)) == 0 && Math.abs(x) < 1e15) {
      return Long.toString((long) x);
    }
    if (Double.isFinite(x) && Math.abs(x) >= 1e-6 && Math.abs(x) < 1e15) {
      return new java.math.BigDecimal(String.format(Locale.ROOT, "%.9g", x)).stripTrailingZeros().toPlainString();
    }
    return String.format(Locale.ROOT, "%.6g", x);
  }

  /**
   * Whether a health word marks the orbit unusable.
   *
   * @param system the system
   * @param health the word as written
   * @return true when unhealthy
   */
  public static boolean unhealthy(Constellation system, int health) {
    return system == Constellation.QZSS ? (health & 0x3E) != 0 : health != 0;
  }

  private static void health(Verdict v) {
    final Constellation sys = v.kepler != null ? v.kepler.system() : Constellation.GLONASS;
    final int h = v.health();
    if (unhealthy(sys, h)) {
      v.reject("unhealthy: health " + h);
    } else if (h != 0) {
      v.notes.add("health " + h + ": only the L6 (LEX) bit is set, the orbit is usable");
    }
  }

  private static void position(Verdict v, OrbitSource precise) {
    if (precise == null) {
      v.notes.add("not checked against a precise orbit (none given)");
      return;
    }
    final double[] rp = new double[3];
    final double[] vp = new double[3];
    final String why = precise.state(v.id(), v.referenceGpsS(), rp, vp);
    if (why != null) {
      v.notes.add("not checked against the precise orbit at its reference epoch: " + why);
      return;
    }
    final double[] rb = new double[3];
    final double[] vb = new double[3];
    if (v.kepler != null) {
      v.kepler.state(v.referenceGpsS(), rb, vb);
    } else {
      System.arraycopy(v.glonass.positionM(), 0, rb, 0, 3);
    }
    final double d = Math.sqrt(sq(rb[0] - rp[0]) + sq(rb[1] - rp[1]) + sq(rb[2] - rp[2]));
    v.positionErrorM = d;
    if (!(d <= POSITION_THRESHOLD_M)) {
      v.reject(String.format(Locale.ROOT, "position at its reference epoch %.1f km from the precise orbit of %s "
          + "(allowed %.0f m)", d / 1e3, v.id(), POSITION_THRESHOLD_M));
    }
  }

  private static double sq(double x) {
    return x * x;
  }

  private static boolean sameData(Verdict a, Verdict b) {
    if (a.kepler != null && b.kepler != null) {
      return a.kepler.sameData(b.kepler);
    }
    return a.glonass != null && b.glonass != null && a.glonass.sameState(b.glonass);
  }

  private static void duplicates(List<Verdict> all, OrbitSource precise) {
    for (int i = 0; i < all.size(); i++) {
      final Verdict a = all.get(i);
      for (int j = 0; j < all.size(); j++) {
        final Verdict b = all.get(j);
        if (i == j || a.id().equals(b.id()) || !sameData(a, b)) {
          continue;
        }
        final String same = "the same data, field for field, as " + b.id() + "'s record at " + b.where();
        if (precise == null || Double.isNaN(a.positionErrorM)) {
          a.reject(same + "; no precise orbit at its reference epoch tells which satellite it belongs to");
        } else if (a.outcome == Outcome.REJECTED && a.positionErrorM > POSITION_THRESHOLD_M) {
          a.reasons.add(0, "filed under the wrong satellite: " + same);
        } else {
          a.notes.add(same + "; the precise orbit confirms it belongs to " + a.id());
        }
      }
    }
  }

  private static void iode(List<Verdict> all) {
    final Map<String, List<Verdict>> bySat = new LinkedHashMap<>();
    for (Verdict v : all) {
      if (v.kepler != null) {
        bySat.computeIfAbsent(v.id(), k -> new ArrayList<>()).add(v);
      }
    }
    for (List<Verdict> list : bySat.values()) {
      for (int i = 0; i < list.size(); i++) {
        final KeplerRecord k = list.get(i).kepler;
        if (k.iode() != (k.iodc() & 0xFF)) {
          list.get(i).reject("IODE " + k.iode() + " is not the 8 low bits of IODC " + k.iodc() + " (a data cutover)");
        }
        for (int j = 0; j < i; j++) {
          final KeplerRecord e = list.get(j).kepler;
          if (e.iode() == k.iode() && !e.sameOrbit(k) && Math.abs(e.toeGpsS() - k.toeGpsS()) <= IODE_REUSE_WINDOW_S) {
            list.get(i).reject("IODE " + k.iode() + " reused within 6 h for another orbit (first at " + e.where() + ")");
            break;
          }
        }
      }
    }
  }

  private static void repeats(List<Verdict> all) {
    for (int i = 0; i < all.size(); i++) {
      final Verdict a = all.get(i);
      if (a.outcome != Outcome.ACCEPTED) {
        continue;
      }
      for (int j = 0; j < i; j++) {
        final Verdict b = all.get(j);
        if (b.outcome == Outcome.ACCEPTED && b.id().equals(a.id()) && sameData(a, b)) {
          a.outcome = Outcome.REPEAT;
          a.reasons.add("same data as the accepted record at " + b.where() + " (received again; kept once)");
          break;
        }
      }
    }
  }

  /**
   * Why a satellite has no accepted record, summed over its verdicts (e.g. "all 13 records
   * rejected: 12 unhealthy: health 63; 1 position ... km from the precise orbit").
   *
   * @param id satellite
   * @param verdicts all verdicts
   * @return the explanation, or null when the satellite has accepted records
   */
  public static String whyNone(String id, List<Verdict> verdicts) {
    final Map<String, Integer> counts = new LinkedHashMap<>();
    int n = 0;
    for (Verdict v : verdicts) {
      if (!v.id().equals(id)) {
        continue;
      }
      n++;
      if (v.outcome != Outcome.REJECTED) {
        return null;
      }
      counts.merge(v.reasons.get(0).replaceAll(" at [^ ;:]+:\\d+", ""), 1, Integer::sum);
    }
    if (n == 0) {
      return "no broadcast record in the navigation files";
    }
    final StringBuilder b = new StringBuilder("all " + n + " broadcast records rejected: ");
    boolean first = true;
    for (Map.Entry<String, Integer> e : counts.entrySet()) {
      b.append(first ? "" : "; ").append(e.getValue()).append(" x ").append(e.getKey());
      first = false;
    }
    return b.toString();
  }
}
