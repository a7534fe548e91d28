package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.eigenzeit.ground.gnss.BroadcastCheck;
import org.eigenzeit.ground.gnss.ClockFile;
import org.eigenzeit.ground.gnss.GlonassPropagator;
import org.eigenzeit.ground.gnss.GlonassRecord;
import org.eigenzeit.ground.gnss.GnssFixtures;
import org.eigenzeit.ground.gnss.NavFile;
import org.eigenzeit.ground.gnss.PreciseOrbit;
import org.eigenzeit.ground.gnss.TermSurvey;
import org.junit.jupiter.api.Test;

/**
 * Real satellites on every fixture day ({@code /gnss/days/}), one rule for all of them: no day,
 * satellite, GPS week or tolerance is written here. Each day's files are classified by content;
 * each precise orbit of the day is surveyed with all of the day's navigation and clock files
 * (without a precise orbit, the broadcast orbits serve). The rule:
 *
 * <ol>
 *   <li><b>Every record judged, every exclusion explained</b>: one verdict per record of the
 *       navigation files; a satellite without comparisons carries its exclusion reason.
 *   <li><b>-2 r.v/c^2 against IS-GPS-200's F e sqrt(A) sin E</b>, per satellite: RMS and maximum of
 *       the difference within the RMS and maximum of what the formula omits by construction
 *       (the second-harmonic radial correction of the same record, IS-GPS-200 Table 20-IV,
 *       {@code KeplerRecord.formulaOmissionBoundS}) plus what an orbit error at the record check's
 *       30 m (GPS SPS Performance Standard 2008, from memory) can add,
 *       2(|v| + n r) 30 m/c^2 (common practice: velocity errors n times position errors); and the
 *       precise against the broadcast orbit's own -2 r.v/c^2 within that orbit bound.
 *   <li><b>The correction model along the real orbit</b>, per satellite with at least 6 h of
 *       precise orbit: the ground reference's proper time (EGM96 degree 36, DE405) minus the
 *       secular rate and -2 r.v/c^2 leaves Kouba's J2 term (Kouba 2004, GPS Solutions 8:170):
 *       adding that term must lower the RMS of what is left, and what is left must stay below the
 *       0.1 ns that Kouba gives for the J2 error of the plain eccentricity correction.
 *   <li><b>GLONASS state vectors</b>: two consecutive accepted records, each propagated by the
 *       ICD's Runge-Kutta scheme to their common midpoint, agree within the record check's 30 m.
 * </ol>
 */
class RealSatelliteCheckTest {
  /** Kouba (2004): the J2 error of the plain eccentricity correction is about 0.1 ns (6 h period). */
  private static final double KOUBA_J2_ERROR_S = 0.1e-9;
  private static final double MIN_ARC_S = 6 * 3600;

  static Path resource(String name) {
    try {
      return Path.of(RealSatelliteCheckTest.class.getResource("/gnss/" + name).toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  @Test
  void everyFixtureDayMeetsTheOneRule() throws IOException {
    double worstRms = 0;
    double worstMax = 0;
    double worstOrbitPart = 0;
    double worstModel = 0;
    double worstGlonass = 0;
    int compared = 0;
    int days = 0;
    for (Path day : GnssFixtures.days()) {
      days++;
      final List<NavFile> nav = new ArrayList<>();
      for (Path p : GnssFixtures.files(day, GnssFixtures.Kind.NAV)) {
        nav.add(NavFile.read(p));
      }
      final List<ClockFile> clocks = new ArrayList<>();
      for (Path p : GnssFixtures.files(day, GnssFixtures.Kind.CLOCK)) {
        clocks.add(ClockFile.read(p));
      }
      final List<PreciseOrbit> orbits = new ArrayList<>();
      for (Path p : GnssFixtures.files(day, GnssFixtures.Kind.SP3)) {
        orbits.add(PreciseOrbit.read(p));
      }
      if (orbits.isEmpty()) {
        orbits.add(null);
      }
      for (PreciseOrbit orbit : orbits) {
        final TermSurvey.Result r = new TermSurvey(orbit, nav, clocks, 0, 0).run();
        final String what = day.getFileName() + " " + r.orbitSource();
        int records = 0;
        for (NavFile f : nav) {
          records += f.keplerRecords().size() + f.glonassRecords().size();
        }
        assertEquals(records, r.verdicts().size(), what + ": one verdict per record");
        for (BroadcastCheck.Verdict v : r.verdicts()) {
          assertTrue(v.outcome() == BroadcastCheck.Outcome.ACCEPTED || !v.reasons().isEmpty(), v.where());
        }
        double dayRms = 0;
        double dayMax = 0;
        final List<String> excluded = new ArrayList<>();
        for (TermSurvey.Satellite s : r.satellites()) {
          final String sat = what + " " + s.id();
          if (s.exclusion() != null) {
            assertFalse(s.exclusion().isBlank(), sat);
            excluded.add(s.id() + ": " + s.exclusion());
          }
          if (Double.isFinite(s.rmsDifferenceS())) {
            compared += orbit != null ? 1 : 0;
            assertTrue(s.rmsDifferenceS() <= s.rmsFormulaBoundS() + s.orbitBoundS(), sat + " RMS " + s.rmsDifferenceS());
            assertTrue(s.maxDifferenceS() <= s.maxFormulaBoundS() + s.orbitBoundS(), sat + " max " + s.maxDifferenceS());
            dayRms = Math.max(dayRms, s.rmsDifferenceS());
            dayMax = Math.max(dayMax, s.maxDifferenceS());
          }
          if (Double.isFinite(s.rmsOrbitPartS())) {
            assertTrue(s.rmsOrbitPartS() <= s.orbitBoundS() && s.maxOrbitPartS() <= s.orbitBoundS(),
                sat + " orbit part " + s.maxOrbitPartS());
            worstOrbitPart = Math.max(worstOrbitPart, s.maxOrbitPartS());
          }
          if (orbit != null && s.secularSpanS() >= MIN_ARC_S) {
            assertTrue(s.rmsModelResidualS() < s.rmsResidualWithoutJ2S(), sat + " J2 term does not help: "
                + s.rmsModelResidualS() + " vs " + s.rmsResidualWithoutJ2S());
            assertTrue(s.maxModelResidualS() <= KOUBA_J2_ERROR_S, sat + " model residual " + s.maxModelResidualS());
            worstModel = Math.max(worstModel, s.maxModelResidualS());
          }
        }
        if (orbit != null) {
          worstRms = Math.max(worstRms, dayRms);
          worstMax = Math.max(worstMax, dayMax);
        }
        System.out.printf(Locale.ROOT, "%s: %d satellites, formula vs orbit worst RMS %.4f ns, worst max %.4f ns;"
            + " excluded %s%n", what, r.satellites().size(), dayRms * 1e9, dayMax * 1e9, excluded);
      }
      for (NavFile f : nav) {
        worstGlonass = Math.max(worstGlonass, glonassMidpoints(f));
      }
    }
    System.out.printf(Locale.ROOT, "all %d days: %d satellites compared between precise orbits and broadcast"
        + " formulas; worst RMS %.4f ns, worst max %.4f ns%n", days, compared, worstRms * 1e9, worstMax * 1e9);
    System.out.printf(Locale.ROOT, "evidence: reference.igs_worst_rms_ns = %.4f%n", worstRms * 1e9);
    System.out.printf(Locale.ROOT, "evidence: reference.igs_worst_max_ns = %.4f%n", worstMax * 1e9);
    System.out.println("evidence: reference.igs_satellites = " + compared);
    System.out.printf(Locale.ROOT, "evidence: gnss.orbit_part_worst_max_ns = %.6f%n", worstOrbitPart * 1e9);
    System.out.printf(Locale.ROOT, "evidence: gnss.model_residual_worst_max_ns = %.4f%n", worstModel * 1e9);
    System.out.printf(Locale.ROOT, "evidence: gnss.glonass_midpoint_worst_m = %.2f%n", worstGlonass);
    assertTrue(days >= 3, "fixture days: " + days);
    assertTrue(compared > 0 && worstModel > 0, "the rule must have run");
  }

  /** Largest midpoint disagreement of consecutive accepted GLONASS records of one slot, m. */
  private static double glonassMidpoints(NavFile f) {
    final Map<String, List<GlonassRecord>> bySlot = new TreeMap<>();
    for (BroadcastCheck.Verdict v : BroadcastCheck.check(List.of(f), null)) {
      if (v.glonass() != null && v.outcome() == BroadcastCheck.Outcome.ACCEPTED) {
        bySlot.computeIfAbsent(v.id(), k -> new ArrayList<>()).add(v.glonass());
      }
    }
    double worst = 0;
    final double[] r1 = new double[3];
    final double[] v1 = new double[3];
    final double[] r2 = new double[3];
    final double[] v2 = new double[3];
    for (List<GlonassRecord> list : bySlot.values()) {
      for (int i = 0; i + 1 < list.size(); i++) {
        final GlonassRecord a = list.get(i);
        final GlonassRecord b = list.get(i + 1);
        if (b.tbGpsS() - a.tbGpsS() > 2 * 900.0) {
          continue; // not neighbours within their validity
        }
        final double mid = (a.tbGpsS() + b.tbGpsS()) / 2;
        GlonassPropagator.propagate(a, mid, GlonassPropagator.STEP_S, r1, v1);
        GlonassPropagator.propagate(b, mid, GlonassPropagator.STEP_S, r2, v2);
        final double d = Math.sqrt(Math.pow(r1[0] - r2[0], 2) + Math.pow(r1[1] - r2[1], 2) + Math.pow(r1[2] - r2[2], 2));
        assertTrue(d <= BroadcastCheck.POSITION_THRESHOLD_M, a.where() + " and " + b.where() + ": " + d + " m");
        worst = Math.max(worst, d);
      }
    }
    return worst;
  }
}
