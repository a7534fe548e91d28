package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.status.Status;
import java.util.ArrayList;
import java.util.List;
import org.eigenzeit.ground.gnss.GnssFixtures;
import org.eigenzeit.ground.gnss.PreciseOrbit;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.onboard.time.SplitTime;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/**
 * The time systems of GNSS files against outside values: TAI - UTC from IAU SOFA (jsofa
 * {@code jauDat}, {@code jauUtctai}); TT - GPS = 51.184 s (TT - TAI = 32.184 s, IAU; TAI - GPS
 * = 19 s, IS-GPS-200 section 3.3.4); GLONASS time = UTC + 3 h (GLONASS ICD 5.1 section 3.3.3);
 * the GPS - UTC of the real files' own headers (15 s in 2010, 16 s in 2012); the GPS week and
 * seconds of week that IGS wrote into its SP3 headers.
 */
class GnssTimeSystemTest {
  private static SplitTime tt(GnssTimeSystem s, int y, int m, int d, int h) {
    return s.toTt(GnssTimeSystem.labelsJ2000(y, m, d, h, 0, 0), 0.0, "test", 1);
  }

  @Test
  void everySystemAgainstTaiAndSofa() throws Exception {
    for (int[] day : new int[][] {{2010, 7, 1}, {2011, 4, 1}, {2012, 10, 31}, {2017, 1, 2}}) {
      final SplitTime gps = tt(GnssTimeSystem.GPS, day[0], day[1], day[2], 0);
      final SplitTime tai = tt(GnssTimeSystem.TAI, day[0], day[1], day[2], 0);
      assertEquals(19.0, gps.secondsSince(tai), 1e-9, "TAI - GPS");
      assertEquals(0.0, tt(GnssTimeSystem.GAL, day[0], day[1], day[2], 0).secondsSince(gps), 1e-9);
      assertEquals(0.0, tt(GnssTimeSystem.QZS, day[0], day[1], day[2], 0).secondsSince(gps), 1e-9);
      assertEquals(14.0, tt(GnssTimeSystem.BDT, day[0], day[1], day[2], 0).secondsSince(gps), 1e-9, "GPS - BDT");
      final double dat = JSOFA.jauDat(day[0], day[1], day[2], 0.0);
      final SplitTime utc = tt(GnssTimeSystem.UTC, day[0], day[1], day[2], 0);
      assertEquals(dat, utc.secondsSince(tai), 1e-9, "TAI - UTC against SOFA dat");
      assertEquals(dat, GnssTimeSystem.taiMinusUtcS(gps), 1e-9);
      // GLONASS time 03:00 is 00:00 UTC
      assertEquals(0.0, tt(GnssTimeSystem.GLO, day[0], day[1], day[2], 3).secondsSince(utc), 1e-9);
      // UTC -> TAI through SOFA's utctai on the two-part Julian date
      final double jd = 2_451_545.0 + (GnssTimeSystem.labelsJ2000(day[0], day[1], day[2], 0, 0, 0) / 86_400.0);
      final JSOFA.JulianDate sofaTai = JSOFA.jauUtctai(Math.floor(jd) + 0.5, jd - Math.floor(jd) - 0.5);
      final SplitTime sofa = new SplitTime();
      assertEquals(Status.OK, sofa.setJulianDate(sofaTai.djm0, sofaTai.djm1));
      final SplitTime ourTai = new SplitTime();
      org.eigenzeit.onboard.time.TimeScales.ttToTai(utc, ourTai);
      assertEquals(0.0, ourTai.secondsSince(sofa), 1e-6);
    }
    assertEquals(51.184, GnssTimeSystem.ttOfGps(GnssTimeSystem.GPS_EPOCH_TO_J2000_S).secondsSince(SplitTime.of(0, 0)),
        1e-9, "TT - GPS at J2000 labels");
    assertEquals(GnssTimeSystem.GPS_EPOCH_TO_J2000_S + 1234.5,
        GnssTimeSystem.gpsSeconds(GnssTimeSystem.ttOfGps(GnssTimeSystem.GPS_EPOCH_TO_J2000_S + 1234.5)), 1e-6);
  }

  @Test
  void unknownSystemsAreRefused() {
    final String m = assertThrows(InputException.class, () -> GnssTimeSystem.of("GMT", "f.sp3", 13)).getMessage();
    assertEquals("f.sp3:13: time system: not supported, found 'GMT', allowed GPS, QZS, GAL, BDT, TAI, UTC, GLO", m);
    assertEquals(GnssTimeSystem.GLO, GnssTimeSystem.of(" glo ", "f", 1));
  }

  @Test
  void weekAndSecondsComeFromTheEpochs() {
    // IGS wrote 1590 345600.0 into line 2 of igs15904.sp3 (2010-07-01 00:00 GPS) and 1629 432000.0
    // into igs16295.sp3 (2011-04-01); week 1712 day 3 is 2012-10-31 (brdc3050.12n records: week 1712, toe 259200).
    final double[][] cases = {{2010, 7, 1, 1590, 345_600}, {2011, 4, 1, 1629, 432_000}, {2012, 10, 31, 1712, 259_200}};
    for (double[] c : cases) {
      final double gps = GnssTimeSystem.labelsJ2000((int) c[0], (int) c[1], (int) c[2], 0, 0, 0)
          + GnssTimeSystem.GPS_EPOCH_TO_J2000_S;
      assertEquals((int) c[3], GnssTimeSystem.gpsWeek(gps));
      assertEquals(c[4], GnssTimeSystem.secondsOfWeek(gps));
    }
  }

  @Test
  void anSp3InUtcIsShiftedByTheLeapSecondsOfItsDay() {
    // The same IGS file relabelled UTC: every epoch is GPS - UTC = 15 s later in GPS time (2010;
    // IGS's own clock file of that day says LEAP SECONDS 15).
    final List<String> gps = GnssFixtures.lines("2010-07-01", "igs15904.sp3.gz");
    final List<String> utc = new ArrayList<>(gps);
    utc.set(12, utc.get(12).substring(0, 9) + "UTC" + utc.get(12).substring(12));
    final PreciseOrbit a = PreciseOrbit.parse("gps.sp3", gps);
    final PreciseOrbit b = PreciseOrbit.parse("utc.sp3", utc);
    assertEquals(GnssTimeSystem.UTC, b.timeSystem());
    assertEquals(15.0, b.epochs("G05")[0] - a.epochs("G05")[0], 1e-6);
    final List<String> glo = new ArrayList<>(gps);
    glo.set(12, glo.get(12).substring(0, 9) + "GLO" + glo.get(12).substring(12));
    assertEquals(15.0 - 3 * 3600, PreciseOrbit.parse("glo.sp3", glo).epochs("G05")[0] - a.epochs("G05")[0], 1e-6);
    final ExternalTrajectory ta = ExternalTrajectory.fromSp3(Sp3File.parse("gps.sp3", gps), "G05", 0);
    final ExternalTrajectory tb = ExternalTrajectory.fromSp3(Sp3File.parse("utc.sp3", utc), "G05", 0);
    assertEquals(15.0, tb.t0Tt().secondsSince(ta.t0Tt()), 1e-6);
    final List<String> bad = new ArrayList<>(gps);
    bad.set(12, bad.get(12).substring(0, 9) + "UT1" + bad.get(12).substring(12));
    assertTrue(assertThrows(InputException.class, () -> ExternalTrajectory.fromSp3(Sp3File.parse("b.sp3", bad), "G05", 0))
        .getMessage().startsWith("b.sp3:13: time system (columns 10-12): found 'UT1'"));
  }
}
