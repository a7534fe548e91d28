package org.eigenzeit.ground.trajectory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Real satellites, 2010-07-01: for every GPS satellite of the IGS final orbit with a healthy
 * broadcast ephemeris, -2 r.v/c^2 from the precise orbit against the IS-GPS-200 term
 * F e sqrt(A) sin E_k from that day's broadcast elements (REFERENCE-VALUES: IS-GPS-200
 * 20.3.3.3.3.1). r.v is frame-independent between ITRF and GCRS (r . (omega x r) = 0), so the
 * Earth-fixed orbit serves directly.
 *
 * <p>Healthy means: IGS gives the satellite a clock (not the 999999.999999 "no value") and the
 * broadcast record used has health 0. On this day G01 (then SVN 49, the IIR-M satellite with the
 * L5 demonstration payload) was broadcast unhealthy all day except one anomalous record at 06:00
 * (health 0 with a different TGD), and IGS published no clock for it: it is excluded, and comparing
 * it anyway gives about 15 ns, the signature of elements that do not describe the IGS orbit.
 */
class RealSatelliteCheckTest {
  private static final double C2 = 299_792_458.0 * 299_792_458.0;
  private static final double WEEK_START_SOW = 345_600.0; // 2010-07-01 00:00 GPS = week 1590, day 4

  static Path resource(String name) {
    try {
      return Path.of(RealSatelliteCheckTest.class.getResource("/gnss/" + name).toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  static final List<String> EXCLUDED = new ArrayList<>();

  /** Per-satellite {prn, rms ns, max ns, count}. */
  static List<double[]> compare() throws IOException {
    final Sp3File sp3 = Sp3File.read(resource("igs15904.sp3"));
    final RinexNavFile nav = RinexNavFile.read(resource("brdc1820.10n"));
    final List<double[]> rows = new ArrayList<>();
    for (String id : sp3.satelliteIds()) {
      final int prn = Integer.parseInt(id.substring(1));
      if (sp3.satellite(id).samples().stream().allMatch(x -> Double.isNaN(x[4]))) {
        EXCLUDED.add(id);
        continue;
      }
      final ExternalTrajectory tr = ExternalTrajectory.fromSp3(sp3, id, -66.25);
      final double[] r = new double[3];
      final double[] v = new double[3];
      double sum2 = 0;
      double max = 0;
      int n = 0;
      for (double t = 4 * 900; t <= tr.spanS() - 4 * 900; t += 900) {
        final BroadcastEphemeris eph = nav.closest(prn, WEEK_START_SOW + t);
        if (eph == null) {
          continue;
        }
        tr.fileFrameState(t, r, v);
        final double precise = -2 * (r[0] * v[0] + r[1] * v[1] + r[2] * v[2]) / C2;
        final double broadcast = eph.relativisticTermS(WEEK_START_SOW + t);
        final double d = (precise - broadcast) * 1e9;
        sum2 += d * d;
        max = Math.max(max, Math.abs(d));
        n++;
      }
      if (n > 0) {
        rows.add(new double[] {prn, Math.sqrt(sum2 / n), max, n});
      }
    }
    return rows;
  }

  @Test
  void preciseOrbitTermAgreesWithBroadcastFormula() throws IOException {
    final List<double[]> rows = compare();
    double worstRms = 0;
    double worstMax = 0;
    int epochs = 0;
    for (double[] row : rows) {
      System.out.printf("G%02d: rms %.4f ns, max %.4f ns over %d epochs%n", (int) row[0], row[1], row[2], (int) row[3]);
      worstRms = Math.max(worstRms, row[1]);
      worstMax = Math.max(worstMax, row[2]);
      epochs += (int) row[3];
    }
    System.out.printf("all %d satellites: worst rms %.4f ns, worst max %.4f ns, %d comparisons%n",
        rows.size(), worstRms, worstMax, epochs);
    System.out.println("excluded (no IGS clock): " + EXCLUDED);
    System.out.printf("evidence: reference.igs_worst_rms_ns = %.4f%n", worstRms);
    System.out.printf("evidence: reference.igs_worst_max_ns = %.4f%n", worstMax);
    System.out.println("evidence: reference.igs_satellites = " + rows.size());
    assertEquals(List.of("G01"), EXCLUDED);
    assertTrue(rows.size() >= 28, "satellites compared: " + rows.size());
    // Expect a few hundredths of a nanosecond (issue requirement).
    assertTrue(worstRms < 0.05, "rms " + worstRms);
    assertTrue(worstMax < 0.1, "max " + worstMax);
  }

  @Test
  void broadcastPositionsAgreeWithPreciseOrbitToMetres() throws IOException {
    // IS-GPS-200 user algorithm against IGS finals: a few metres (broadcast orbit accuracy,
    // common practice: about 1-2 m RMS in 2010).
    final Sp3File sp3 = Sp3File.read(resource("igs15904.sp3"));
    final RinexNavFile nav = RinexNavFile.read(resource("brdc1820.10n"));
    final ExternalTrajectory tr = ExternalTrajectory.fromSp3(sp3, "G05", -66.25);
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (double t = 3600; t < 80_000; t += 3600) {
      final BroadcastEphemeris eph = nav.closest(5, WEEK_START_SOW + t);
      tr.fileFrameState(t, r, v);
      final double[] b = eph.positionEcef(WEEK_START_SOW + t);
      final double d = Math.sqrt(Math.pow(b[0] - r[0], 2) + Math.pow(b[1] - r[1], 2) + Math.pow(b[2] - r[2], 2));
      assertTrue(d < 10.0, "G05 at " + t + ": " + d + " m");
    }
    assertEquals("GPS", sp3.timeSystem());
    assertEquals('c', sp3.version());
  }
}
