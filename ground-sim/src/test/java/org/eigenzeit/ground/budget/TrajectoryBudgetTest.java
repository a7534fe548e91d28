package org.eigenzeit.ground.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.ground.gnss.GnssFixtures;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.eigenzeit.ground.trajectory.GnssTimeSystem;
import org.eigenzeit.ground.trajectory.OemFile;
import org.eigenzeit.ground.trajectory.Sp3File;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ClosedForms;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * The secular rate beside the end-offset rate, and the budget along trajectory files (a real SP3
 * orbit, an OEM written from the reference).
 */
class TrajectoryBudgetTest {
  /** An OEM (GCRF, TT) of a reference trajectory at 60 s. */
  static List<String> oem(ReferenceTrajectory tr, SplitTime t0, double span) {
    final List<String> oem = new ArrayList<>(List.of("CCSDS_OEM_VERS = 2.0", "META_START", "OBJECT_NAME = TESTSAT",
        "CENTER_NAME = EARTH", "REF_FRAME = GCRF", "TIME_SYSTEM = TT", "META_STOP"));
    final double[] r = new double[3];
    final double[] v = new double[3];
    final DateTimeFormatter f = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss", Locale.ROOT);
    for (double t = 0; t <= span; t += 60) {
      tr.state(t, r, v);
      final String epoch = LocalDateTime.of(2000, 1, 1, 12, 0).plusSeconds(t0.wholeSeconds() + (long) t).format(f);
      oem.add(String.format(Locale.ROOT, "%s %.9f %.9f %.9f %.12f %.12f %.12f", epoch, r[0] / 1e3, r[1] / 1e3, r[2] / 1e3,
          v[0] / 1e3, v[1] / 1e3, v[2] / 1e3));
    }
    return oem;
  }

  @Test
  void secularRateIsFreeOfTheEccentricityTermWhereTheEndOffsetRateIsNot() {
    // The lyra-heo demo orbit (a = 26000 km, e = 0.16, i = 50 deg, from perigee), one day = 2.07
    // orbits, about a point mass so that the Keplerian closed forms hold exactly: secular rate
    // -(3GM/2a - W0)/c^2 and r.v = sqrt(GM a) e sin E (docs/algorithms.md; IS-GPS-200 20.3.3.3.3.1).
    final double a = 26_000_000.0;
    final double e = 0.16;
    final double gm = CentralBody.EARTH.gmM3PerS2();
    final OrbitSpec o = OrbitSpec.fromElements(CentralBody.EARTH, a, e, 50, 200, 270, 0);
    final SplitTime t0 = SplitTime.of(844_000_000L, 0);
    final double day = 86_400;
    final ReferenceConfig pointMass = BudgetAnalysis.referenceFor(CentralBody.EARTH).withDegree(0).withThirdBodies(null);
    final ReferenceTrajectory tr = new ReferencePropagator(pointMass).propagate(t0, o.position(), o.velocity(), day + 600);
    final BudgetResult r = BudgetAnalysis.analyseTrajectory("heo", ExternalTrajectory.fromOem(OemFile.parse("heo.oem",
        oem(tr, t0, day + 600)), -69.2), pointMass, day, 10, BudgetAnalysis.coreFor(CentralBody.EARTH, 8));
    final double secular = ClosedForms.secularRate(CentralBody.EARTH, a, Math.toRadians(50), false);
    final double n = Math.sqrt(gm / (a * a * a));
    double ek = n * day;
    for (int i = 0; i < 50; i++) {
      ek -= (ek - e * Math.sin(ek) - n * day) / (1 - e * Math.cos(ek));
    }
    final double endShare = -2 * Math.sqrt(gm * a) * e * Math.sin(ek) / CentralBody.C2 / day;
    System.out.printf(Locale.ROOT, "HEO e = 0.16 about a point mass, 24 h: secular %.9e (closed form %.9e),"
        + " end offset / span %.9e: %+.4f us/day from the eccentricity term (closed form %+.4f)%n",
        r.referenceSecularRate(), secular, r.referenceMeanRate(), (r.referenceMeanRate() - secular) * 86_400e6,
        endShare * 86_400e6);
    System.out.printf(Locale.ROOT, "evidence: budget.heo_point_mass_end_share_us_per_day = %.4f%n",
        (r.referenceMeanRate() - r.referenceSecularRate()) * 86_400e6);
    assertEquals(secular, r.referenceSecularRate(), 1e-18);
    assertEquals(secular + endShare, r.referenceMeanRate(), 1e-18);
    // The same orbit with the full reference (EGM96 36, DE405): the demo's budget figure.
    final BudgetResult full = BudgetAnalysis.analyse("lyra-heo", o, t0, day, 10, 0);
    final double share = full.referenceMeanRate() - full.referenceSecularRate();
    System.out.printf(Locale.ROOT, "evidence: budget.heo_end_offset_minus_secular_us_per_day = %.4f%n", share * 86_400e6);
    assertEquals(endShare, share, 0.01 * Math.abs(endShare), "the J2 field moves r.v(T) by about 1 %");
    assertEquals(full.referenceSecularRate(), full.coreSecularRate(), 1e-17);
  }

  @Test
  void budgetAlongARealSp3Orbit() {
    final List<String> lines = GnssFixtures.lines("2010-07-01", "igs15904.sp3.gz");
    final ExternalTrajectory g05 = ExternalTrajectory.fromSp3(Sp3File.parse("igs15904.sp3", lines), "G05", 0);
    final double ut1MinusTt = 0 - GnssTimeSystem.taiMinusUtcS(g05.t0Tt()) - 32.184;
    final ExternalTrajectory traj = g05.withUt1MinusTt(ut1MinusTt);
    final ReferenceConfig cfg = new ReferenceConfig(CentralBody.EARTH, 36,
        BudgetAnalysis.referenceFor(CentralBody.EARTH).thirdBodies(), 0, 0, false,
        ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 1e-13, ut1MinusTt, null);
    final BudgetResult r = BudgetAnalysis.analyseTrajectory("G05", traj, cfg, traj.spanS(), 10,
        BudgetAnalysis.coreFor(CentralBody.EARTH, 8));
    System.out.printf(Locale.ROOT, "G05 2010-07-01 (IGS final), %.2f h: secular core %.9e ref %.9e (diff %.2e),"
        + " end-offset rate %.9e, max offset difference %.3f ps%n", r.spanS() / 3600, r.coreSecularRate(),
        r.referenceSecularRate(), r.coreMinusReferenceSecularRate(), r.referenceMeanRate(), r.maxOffsetDifferenceS() * 1e12);
    System.out.printf(Locale.ROOT, "evidence: budget.sp3_g05_secular_core_minus_ref = %.2e%n",
        Math.abs(r.coreMinusReferenceSecularRate()));
    System.out.printf(Locale.ROOT, "evidence: budget.sp3_g05_max_offset_difference_ps = %.3f%n", r.maxOffsetDifferenceS() * 1e12);
    // docs/algorithms.md commits the core to 1e-17 in rate for MEO; the offset difference along a
    // real orbit (forces the core does not model enter through r.a) is pinned at 10x its measurement.
    assertTrue(Math.abs(r.coreMinusReferenceSecularRate()) < 1e-17);
    assertTrue(r.maxOffsetDifferenceS() < 120e-12, "offset difference " + r.maxOffsetDifferenceS());
    // IS-GPS-200 3.3.1.1: a GPS clock gains about 38.6 us/day (Ashby 2003), secular
    assertEquals(38.6, r.referenceSecularRate() * 86_400e6, 0.1);
  }

  @Test
  void budgetAlongAnOemWrittenFromTheReferenceMatchesTheReferenceItself() {
    final SplitTime t0 = SplitTime.of(846_000_000L, 0.0);
    final OrbitSpec o = OrbitSpec.fromElements(CentralBody.EARTH, 26_561_750.0, 0.01, 55, 30, 40, 10);
    final double span = 6 * 3600;
    final BudgetResult direct = BudgetAnalysis.analyse("direct", o, t0, span, 10, BudgetAnalysis.coreFor(CentralBody.EARTH, 8));
    final ReferenceTrajectory tr = new ReferencePropagator(BudgetAnalysis.referenceFor(CentralBody.EARTH))
        .propagate(t0, o.position(), o.velocity(), span + 600);
    final ExternalTrajectory ext = ExternalTrajectory.fromOem(OemFile.parse("t.oem", oem(tr, t0, span + 600)), -69.2);
    final BudgetResult along = BudgetAnalysis.analyseTrajectory("oem", ext, BudgetAnalysis.referenceFor(CentralBody.EARTH),
        span, 10, BudgetAnalysis.coreFor(CentralBody.EARTH, 8));
    System.out.printf(Locale.ROOT, "OEM round trip, 6 h: reference secular %.3e vs %.3e, core %.3e vs %.3e%n",
        along.referenceSecularRate(), direct.referenceSecularRate(), along.coreSecularRate(), direct.coreSecularRate());
    assertEquals(direct.referenceSecularRate(), along.referenceSecularRate(), 1e-18);
    assertEquals(direct.coreSecularRate(), along.coreSecularRate(), 1e-18);
    assertEquals(direct.referenceMeanRate(), along.referenceMeanRate(), 1e-18);
  }
}
