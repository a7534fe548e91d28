package org.eigenzeit.hostexample;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ClosedForms;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.corrector.ClockCorrector;

/**
 * An example flight-software host: a fixed-rate 1 Hz scheduler that feeds the onboard core from a
 * recorded input file (format in the file's header and docs/integration.md), injects the faults
 * the file describes (an orbit outage, a bad sample, a timing outage, a processor reset with warm
 * restart) and prints housekeeping. Uses only the public API of {@code org.eigenzeit.onboard}.
 *
 * <p>Start-up allocates everything (the file is parsed into arrays first); the 1 Hz loop itself
 * allocates nothing but the printed lines.
 *
 * <p>Usage: {@code HostLoop [input-file]} (default: the recorded pass shipped with the example).
 */
public final class HostLoop {
  private HostLoop() {}

  /**
   * Runs the example.
   *
   * @param args optional input file
   * @throws IOException when the input cannot be read
   */
  public static void main(String[] args) throws IOException {
    final List<String> lines;
    if (args.length > 0) {
      lines = Files.readAllLines(Path.of(args[0]), StandardCharsets.US_ASCII);
    } else {
      try (InputStream in = HostLoop.class.getResourceAsStream("recorded-pass.txt");
          BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII))) {
        lines = new ArrayList<>();
        String l;
        while ((l = r.readLine()) != null) {
          lines.add(l);
        }
      }
    }
    final int rc = run(lines, System.out);
    if (rc != 0) {
      System.exit(rc);
    }
  }

  /** The recorded inputs, indexed by whole second. */
  static final class Recording {
    long startTt;
    double clockOffsetS;
    double clockRate;
    final int lastSecond;
    final double[][] orbit;
    final double[] noiseNs;
    final int[] source;
    final boolean[] reset;

    Recording(int lastSecond) {
      this.lastSecond = lastSecond;
      this.orbit = new double[lastSecond + 1][];
      this.noiseNs = new double[lastSecond + 1];
      this.source = new int[lastSecond + 1];
      java.util.Arrays.fill(source, -1);
      this.reset = new boolean[lastSecond + 1];
    }
  }

  static Recording parse(List<String> lines) {
    int last = 0;
    for (String l : lines) {
      final String[] f = l.trim().split("\\s+");
      if (f.length >= 2 && (f[0].equals("O") || f[0].equals("M") || f[0].equals("R"))) {
        last = Math.max(last, Integer.parseInt(f[1]));
      }
    }
    final Recording rec = new Recording(last);
    int lineNo = 0;
    for (String l : lines) {
      lineNo++;
      final String t = l.trim();
      if (t.isEmpty() || t.startsWith("#")) {
        continue;
      }
      final String[] f = t.split("\\s+");
      try {
        if (f[0].equals("start_tt")) {
          rec.startTt = Long.parseLong(f[1]);
        } else if (f[0].equals("clock")) {
          rec.clockOffsetS = Double.parseDouble(f[1]);
          rec.clockRate = Double.parseDouble(f[2]);
        } else if (f[0].equals("O")) {
          final double[] o = new double[7];
          for (int k = 0; k < 7; k++) {
            o[k] = Double.parseDouble(f[2 + k]);
          }
          rec.orbit[Integer.parseInt(f[1])] = o;
        } else if (f[0].equals("M")) {
          final int s = Integer.parseInt(f[1]);
          rec.noiseNs[s] = Double.parseDouble(f[2]);
          rec.source[s] = "1".equals(f[4]) ? Integer.parseInt(f[3]) : -2;
        } else if (f[0].equals("R")) {
          rec.reset[Integer.parseInt(f[1])] = true;
        } else {
          throw new IllegalArgumentException("unknown record '" + f[0] + "'");
        }
      } catch (RuntimeException e) {
        throw new IllegalArgumentException("input line " + lineNo + ": " + e.getMessage(), e);
      }
    }
    return rec;
  }

  static ClockCorrector build(ModelConfig cfg, byte[] table) {
    final ClockCorrector corrector = new ClockCorrector(cfg, true, false);
    if (corrector.loadTable(TableId.SERVO, table, 0, table.length) != Status.OK
        || corrector.activateTable(TableId.SERVO) != Status.OK) {
      throw new IllegalStateException("parameter table refused");
    }
    return corrector;
  }

  /**
   * Runs the loop over a recording.
   *
   * @param lines the input file's lines
   * @param out where housekeeping goes
   * @return 0 on success
   */
  static int run(List<String> lines, PrintStream out) {
    final Recording rec = parse(lines);
    // Construction and table upload (start-up: allocation allowed here).
    final ModelConfig cfg = ModelConfig.builder().level(ModelLevel.HARMONICS).degree(36).tides(true)
        .energyToleranceRel(2e-3).build();
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    final double[] values = ServoParameters.typicalRubidium();
    values[ServoParameters.F_SIGMA_SOURCE0] = 5e-9;
    values[ServoParameters.F_TIME_CONSTANT_TRACK_S] = 600;
    values[ServoParameters.F_MEASUREMENT_MAX_AGE_S] = 15;
    if (ServoParameters.encode(values, table, 0) != Status.OK) {
      throw new IllegalStateException("the example's servo table does not encode");
    }
    ClockCorrector corrector = build(cfg, table);
    final byte[] restartBuffer = new byte[ClockCorrector.STATE_BYTES];
    final OrbitSample sample = new OrbitSample();
    final TimeOffsetMeasurement meas = new TimeOffsetMeasurement();
    final Housekeeping hk = new Housekeeping();
    final SplitTime tt = new SplitTime();
    final SplitTime raw = new SplitTime();
    final SplitTime corrected = new SplitTime();
    final SplitTime before = new SplitTime();
    final CucCodec cuc = CucCodec.level1(4, 3);
    final byte[] stamp = new byte[cuc.codeOctets()];
    // The example's stand-in for the counter's proper time: the closed-form mean rate of the orbit.
    final double[] first = rec.orbit[0];
    final double radius = Math.sqrt(first[0] * first[0] + first[1] * first[1] + first[2] * first[2]);
    final double rel = ClosedForms.secularRate(CentralBody.EARTH, radius, Math.acos(0.8), true);
    out.printf(Locale.ROOT, "host: %d s recorded pass, 1 Hz cycle, restart buffer %d bytes, parameter table %d bytes%n",
        rec.lastSecond, ClockCorrector.STATE_BYTES, ServoParameters.TABLE_BYTES);
    int lastMode = -1;
    double resetStepS = Double.NaN;
    for (int t = 0; t <= rec.lastSecond; t++) {
      final int ttSet = tt.set(rec.startTt + t, 0.0);
      final int rawSet = raw.set(rec.startTt + t, rec.clockOffsetS + rec.clockRate * t + rel * t);
      if (ttSet != Status.OK || rawSet != Status.OK) { // a non-finite reading: no cycle on it
        out.printf(Locale.ROOT, "t=%5d  CLOCK READING REFUSED: %s%n", t, Status.name(ttSet != Status.OK ? ttSet : rawSet));
        continue;
      }
      if (rec.reset[t]) {
        final int saved = corrector.save(restartBuffer, 0, restartBuffer.length);
        corrector.correctedTime(raw, before);
        corrector = build(cfg, table); // the processor restarts: a new core, then warm restart
        final int st = corrector.restore(restartBuffer, 0, restartBuffer.length);
        corrector.correctedTime(raw, corrected);
        resetStepS = corrected.secondsSince(before);
        out.printf(Locale.ROOT, "t=%5d  RESET: save %s, restore %s, realised-time step %.3e s%n", t, Status.name(saved),
            Status.name(st), resetStepS);
      }
      OrbitSample orbitIn = null;
      final double[] o = rec.orbit[t];
      if (o != null) {
        sample.set(tt, OrbitSample.FRAME_INERTIAL, o[0], o[1], o[2], o[3], o[4], o[5], o[6] != 0);
        orbitIn = sample;
      }
      TimeOffsetMeasurement measIn = null;
      if (rec.source[t] != -1) {
        corrector.correctedTime(raw, corrected);
        meas.set(corrected, Math.max(0, rec.source[t]), corrected.secondsSince(tt) + rec.noiseNs[t] * 1e-9,
            rec.source[t] >= 0);
        measIn = meas;
      }
      final int verdict = corrector.cycle(raw, orbitIn, measIn); // a measurement's verdict is also counted in housekeeping
      if (measIn == null && verdict != Status.OK) {
        out.printf(Locale.ROOT, "t=%5d  CYCLE REFUSED: %s%n", t, Status.name(verdict));
      }
      corrector.housekeeping(hk);
      final int stamped = corrector.stampCuc(raw, cuc, stamp, 0);
      if (stamped != Status.OK) {
        out.printf(Locale.ROOT, "t=%5d  CUC STAMP REFUSED: %s%n", t, Status.name(stamped));
      }
      if (hk.mode() != lastMode || t % 900 == 0 || t == rec.lastSecond) {
        corrector.correctedTime(raw, corrected);
        out.printf(Locale.ROOT, "t=%5d  mode %-7s  time error %9.3f ns  est %8.3f +- %6.3f ns  cmd %9.2e  orbit %-16s "
            + "model y %.6e  meas ok %d outlier %d  orbit faults %d%n", t, ServoMode.name(hk.mode()),
            corrected.secondsSince(tt) * 1e9, hk.phaseS() * 1e9, hk.sigmaPhaseS() * 1e9, hk.command(),
            Status.name(hk.orbitSolutionStatus()), hk.modelRate(), hk.measurementCounts(Status.OK),
            hk.measurementCounts(Status.OUTLIER), faults(hk));
        lastMode = hk.mode();
      }
    }
    corrector.correctedTime(raw, corrected);
    out.printf(Locale.ROOT, "host: end, mode %s, time error %.3f ns, reset step %.3e s, orbit faults %d (NOT_FINITE %d), "
        + "CUC stamp %s%n", ServoMode.name(hk.mode()), corrected.secondsSince(tt) * 1e9, resetStepS, faults(hk),
        hk.orbitCounts(Status.NOT_FINITE), hex(stamp));
    return 0;
  }

  private static int faults(Housekeeping hk) {
    int n = 0;
    for (int c = Status.FIRST_FAULT; c < Status.COUNT; c++) {
      n += hk.orbitCounts(c);
    }
    return n;
  }

  private static String hex(byte[] b) {
    final StringBuilder sb = new StringBuilder();
    for (byte x : b) {
      sb.append(String.format(Locale.ROOT, "%02X", x & 0xFF));
    }
    return sb.toString();
  }
}
