package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Reader of CCSDS Orbit Ephemeris Messages in keyword-value notation (CCSDS 502.0-B-2, "Orbit
 * Data Messages", 2009, section 5): header ({@code CCSDS_OEM_VERS}), one or more segments of
 * metadata ({@code META_START} .. {@code META_STOP}: OBJECT_NAME, CENTER_NAME, REF_FRAME,
 * TIME_SYSTEM, ...) and ephemeris lines {@code epoch x y z vx vy vz [ax ay az]} in km and km/s;
 * {@code COMMENT} lines and covariance blocks are skipped.
 *
 * <p>Epochs are converted to TT: TIME_SYSTEM TT, TAI, GPS (TAI - 19 s) and UTC (through the
 * shipped leap-second table) are accepted. Frames: EME2000, GCRF, ICRF (inertial) and ITRF*
 * (Earth-fixed). Immutable after parsing.
 */
public final class OemFile {
  /** One ephemeris line: TT epoch, position (m), velocity (m/s). */
  public record Sample(SplitTime epochTt, double[] positionM, double[] velocityMPerS) {
    /** Defensive copies. */
    public Sample {
      epochTt = SplitTime.of(epochTt.wholeSeconds(), epochTt.fractionS());
      positionM = positionM.clone();
      velocityMPerS = velocityMPerS.clone();
    }

    @Override
    public double[] positionM() {
      return positionM.clone();
    }

    @Override
    public double[] velocityMPerS() {
      return velocityMPerS.clone();
    }

    @Override
    public SplitTime epochTt() {
      return SplitTime.of(epochTt.wholeSeconds(), epochTt.fractionS());
    }
  }

  private final Map<String, String> metadata;
  private final List<Sample> samples;

  private OemFile(Map<String, String> metadata, List<Sample> samples) {
    this.metadata = Map.copyOf(metadata);
    this.samples = List.copyOf(samples);
  }

  /**
   * Reads a file.
   *
   * @param path the file
   * @return the message
   * @throws IOException when it cannot be read
   * @throws TrajectoryFormatException with the line number when malformed
   */
  public static OemFile read(Path path) throws IOException {
    return parse(String.valueOf(path.getFileName()), Files.readAllLines(path, StandardCharsets.US_ASCII));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the message
   */
  public static OemFile parse(String name, List<String> lines) {
    final Map<String, String> meta = new LinkedHashMap<>();
    final List<Sample> out = new ArrayList<>();
    boolean versionSeen = false;
    boolean inMeta = false;
    boolean inCovariance = false;
    for (int i = 0; i < lines.size(); i++) {
      final int lineNo = i + 1;
      final String t = lines.get(i).trim();
      if (t.isEmpty() || t.startsWith("COMMENT")) {
        continue;
      }
      if (t.startsWith("CCSDS_OEM_VERS")) {
        versionSeen = true;
        continue;
      }
      if (!versionSeen) {
        throw new TrajectoryFormatException(name, lineNo, "CCSDS_OEM_VERS must come first");
      }
      if (t.equals("META_START")) {
        inMeta = true;
      } else if (t.equals("META_STOP")) {
        inMeta = false;
        require(name, lineNo, meta, "REF_FRAME");
        require(name, lineNo, meta, "TIME_SYSTEM");
        require(name, lineNo, meta, "CENTER_NAME");
      } else if (t.equals("COVARIANCE_START")) {
        inCovariance = true;
      } else if (t.equals("COVARIANCE_STOP")) {
        inCovariance = false;
      } else if (inMeta || (!inCovariance && t.contains("=") && out.isEmpty())) {
        final int eq = t.indexOf('=');
        if (eq < 0) {
          throw new TrajectoryFormatException(name, lineNo, "metadata line without '=': " + t);
        }
        meta.put(t.substring(0, eq).trim(), t.substring(eq + 1).trim());
      } else if (!inCovariance) {
        if (!meta.containsKey("TIME_SYSTEM")) {
          throw new TrajectoryFormatException(name, lineNo, "ephemeris line before the metadata block");
        }
        out.add(dataLine(name, lineNo, t, meta.get("TIME_SYSTEM")));
      }
    }
    if (!versionSeen) {
      throw new TrajectoryFormatException(name, 1, "not an OEM: no CCSDS_OEM_VERS line");
    }
    if (out.size() < 2) {
      throw new TrajectoryFormatException(name, lines.size(), "fewer than two ephemeris lines");
    }
    for (int k = 1; k < out.size(); k++) {
      if (out.get(k).epochTt().compareTo(out.get(k - 1).epochTt()) <= 0) {
        throw new TrajectoryFormatException(name, lines.size(), "epochs must increase (sample " + (k + 1) + ")");
      }
    }
    return new OemFile(meta, out);
  }

  private static void require(String name, int lineNo, Map<String, String> meta, String key) {
    if (!meta.containsKey(key)) {
      throw new TrajectoryFormatException(name, lineNo, "metadata lacks " + key);
    }
  }

  private static Sample dataLine(String name, int lineNo, String t, String timeSystem) {
    final String[] f = t.split("\\s+");
    if (f.length != 7 && f.length != 10) {
      throw new TrajectoryFormatException(name, lineNo,
          "ephemeris line needs epoch and 6 (or 9) numbers, found " + (f.length - 1));
    }
    final SplitTime tt = Epochs.toTt(name, lineNo, f[0], timeSystem);
    final double[] p = new double[3];
    final double[] v = new double[3];
    try {
      for (int k = 0; k < 3; k++) {
        p[k] = Double.parseDouble(f[1 + k]) * 1e3;
        v[k] = Double.parseDouble(f[4 + k]) * 1e3;
      }
    } catch (NumberFormatException e) {
      throw new TrajectoryFormatException(name, lineNo, "unreadable number: " + e.getMessage());
    }
    return new Sample(tt, p, v);
  }

  /**
   * A metadata value.
   *
   * @param key keyword such as REF_FRAME
   * @return the value, or null
   */
  public String metadata(String key) {
    return metadata.get(key);
  }

  /** @return the ephemeris lines, TT */
  public List<Sample> samples() {
    return samples;
  }

  /** @return whether REF_FRAME is an Earth-fixed (ITRF) frame */
  public boolean isEarthFixed() {
    return metadata.getOrDefault("REF_FRAME", "").toUpperCase(Locale.ROOT).startsWith("ITRF");
  }
}
