package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.input.TextFiles;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Reader of CCSDS Orbit Ephemeris Messages in keyword-value notation (CCSDS 502.0-B-2, "Orbit
 * Data Messages", 2009, section 5): header ({@code CCSDS_OEM_VERS}, {@code CREATION_DATE},
 * {@code ORIGINATOR}), then one or more segments, each a metadata block ({@code META_START} ..
 * {@code META_STOP}), ephemeris lines {@code epoch x y z vx vy vz [ax ay az]} in km, km/s and
 * km/s^2, and an optional covariance block ({@code COVARIANCE_START} .. {@code COVARIANCE_STOP}).
 *
 * <p>Segments are kept apart: each has its own metadata, and its own frame and time system; the
 * file is never merged into one list. Checks, each refusal naming the file and the line: keywords
 * known and not repeated within a block, mandatory keywords present and not empty; {@code
 * TIME_SYSTEM} TT, TAI, GPS or UTC; {@code REF_FRAME} one this reader can transform correctly
 * ({@link Frame}: ITRF-family as Earth-fixed, GCRF and ICRF as GCRS axes, EME2000 with the IAU 2000
 * frame bias), TEME, TOD and every other frame refused by name; an Earth-fixed frame only with
 * {@code CENTER_NAME = EARTH}; epochs calendar-valid (see {@link Epochs}), strictly increasing within
 * a segment (the offending line is named), inside the segment's {@code START_TIME} ..
 * {@code STOP_TIME}, and segments in time order without overlap (a shared boundary epoch, as at a
 * manoeuvre, is allowed); every number finite; a covariance block terminated, its matrices complete
 * (6 rows of the lower triangle) with non-negative variances. Which centre the analysis needs is
 * the caller's check ({@link ExternalTrajectory#fromOem}).
 *
 * <p>Epochs are converted to TT. Immutable after parsing.
 */
public final class OemFile {
  /**
   * One ephemeris line: TT epoch, position (m), velocity (m/s), in the segment's frame.
   *
   * @param epochTt the epoch, TT
   * @param positionM position, m
   * @param velocityMPerS velocity, m/s
   * @param line 1-based line in the file
   */
  public record Sample(SplitTime epochTt, double[] positionM, double[] velocityMPerS, int line) {
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

  /** The reference frames this reader accepts, and how each is brought to the GCRS. */
  public enum Frame {
    /** An ITRF realisation: Earth-fixed, rotated to the GCRS by the Earth orientation model. */
    EARTH_FIXED,
    /** GCRF, or ICRF axes about the Earth: taken as the GCRS (same axes). */
    GCRS,
    /** EME2000 (J2000 mean equator and equinox): rotated to the GCRS by the IAU 2000 frame bias. */
    EME2000
  }

  /** One segment: metadata, its lines, and its ephemeris lines. */
  public static final class Segment {
    private final Map<String, String> metadata;
    private final Map<String, Integer> metadataLines;
    private final List<Sample> samples;
    private final Frame frame;
    private final int metaStartLine;

    private Segment(Map<String, String> metadata, Map<String, Integer> metadataLines, List<Sample> samples,
        Frame frame, int metaStartLine) {
      this.metadata = Map.copyOf(metadata);
      this.metadataLines = Map.copyOf(metadataLines);
      this.samples = List.copyOf(samples);
      this.frame = frame;
      this.metaStartLine = metaStartLine;
    }

    /**
     * A metadata value.
     *
     * @param key keyword such as REF_FRAME
     * @return the value, or null when absent
     */
    public String metadata(String key) {
      return metadata.get(key);
    }

    /**
     * The line of a metadata keyword, for messages.
     *
     * @param key keyword
     * @return the 1-based line, or the META_START line when absent
     */
    public int metadataLine(String key) {
      return metadataLines.getOrDefault(key, metaStartLine);
    }

    /** @return the ephemeris lines, TT epochs */
    public List<Sample> samples() {
      return samples;
    }

    /** @return the segment's frame */
    public Frame frame() {
      return frame;
    }

    /** @return the line of META_START */
    public int metaStartLine() {
      return metaStartLine;
    }
  }

  private static final Pattern KEY = Pattern.compile("[A-Z][A-Z0-9_]*");
  private static final Pattern ITRF = Pattern.compile("ITRF(-(8[89]|9[0-7])|19(8[89]|9[0-7])|20(00|05|08|14|20))?");
  private static final List<String> HEADER_KEYS = List.of("CREATION_DATE", "ORIGINATOR", "MESSAGE_ID");
  private static final List<String> META_KEYS = List.of("OBJECT_NAME", "OBJECT_ID", "CENTER_NAME", "REF_FRAME",
      "REF_FRAME_EPOCH", "TIME_SYSTEM", "START_TIME", "USEABLE_START_TIME", "USEABLE_STOP_TIME", "STOP_TIME",
      "INTERPOLATION", "INTERPOLATION_DEGREE");
  private static final List<String> META_REQUIRED = List.of("OBJECT_NAME", "OBJECT_ID", "CENTER_NAME", "REF_FRAME",
      "TIME_SYSTEM", "START_TIME", "STOP_TIME");
  private static final String FRAMES = "ITRF, ITRF-88..ITRF-97, ITRF2000, ITRF2005, ITRF2008, ITRF2014, ITRF2020 "
      + "(Earth-fixed), GCRF, ICRF, EME2000 (inertial)";

  private final String name;
  private final List<Segment> segments;

  private OemFile(String name, List<Segment> segments) {
    this.name = name;
    this.segments = List.copyOf(segments);
  }

  /**
   * Reads a file.
   *
   * @param path the file
   * @return the message
   * @throws IOException never (kept for callers written against earlier versions); an unreadable
   *     file is an {@link org.eigenzeit.ground.input.InputException}
   * @throws TrajectoryFormatException with the line number when malformed
   */
  public static OemFile read(Path path) throws IOException {
    return parse(String.valueOf(path.getFileName()), TextFiles.readAsciiLines(path));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the message
   * @throws TrajectoryFormatException naming the line of the first defect
   */
  public static OemFile parse(String name, List<String> lines) {
    return new Parser(name, lines).run();
  }

  /** The reader's states, in file order. */
  private enum State { START, HEADER, META, DATA, COVARIANCE }

  private static final class Parser {
    final String name;
    final List<String> lines;
    final List<Segment> segments = new ArrayList<>();
    final Map<String, String> header = new LinkedHashMap<>();
    final Map<String, Integer> headerLines = new LinkedHashMap<>();
    Map<String, String> meta;
    Map<String, Integer> metaLines;
    List<Sample> samples;
    int metaStart;
    int covarianceStart;
    int covarianceRows;
    boolean dataSeen;
    String version;
    String timeSystem;
    Frame frame;
    SplitTime startTt;
    SplitTime stopTt;
    State state = State.START;

    Parser(String name, List<String> lines) {
      this.name = name;
      this.lines = lines;
    }

    OemFile run() {
      for (int i = 0; i < lines.size(); i++) {
        line(lines.get(i).strip(), i + 1);
      }
      final int last = Math.max(1, lines.size());
      switch (state) {
        case START -> throw new TrajectoryFormatException(name, 1, "not an OEM: no CCSDS_OEM_VERS line");
        case HEADER -> throw new TrajectoryFormatException(name, last, "no segment (META_START) after the header");
        case META -> throw new TrajectoryFormatException(name, metaStart, "META_START without META_STOP");
        case COVARIANCE -> throw new TrajectoryFormatException(name, covarianceStart,
            "COVARIANCE_START without COVARIANCE_STOP before the end of the file");
        default -> closeSegment(last);
      }
      return new OemFile(name, segments);
    }

    private void line(String t, int lineNo) {
      if (t.isEmpty()) {
        return;
      }
      if (t.equals("COMMENT") || t.startsWith("COMMENT ")) {
        comment(lineNo);
        return;
      }
      switch (state) {
        case START -> version(t, lineNo);
        case HEADER -> {
          if (t.equals("META_START")) {
            headerDone(lineNo);
            openSegment(lineNo);
          } else {
            keyValue(t, lineNo, header, headerLines, HEADER_KEYS, "header");
          }
        }
        case META -> {
          if (t.equals("META_STOP")) {
            metaDone(lineNo);
          } else {
            keyValue(t, lineNo, meta, metaLines, META_KEYS, "metadata");
          }
        }
        case DATA -> dataOrNext(t, lineNo);
        default -> covariance(t, lineNo);
      }
    }

    private void comment(int lineNo) {
      if (state == State.DATA && dataSeen) {
        throw new TrajectoryFormatException(name, lineNo, "COMMENT between ephemeris lines, allowed only at the "
            + "start of a header, metadata, data or covariance block");
      }
    }

    private void version(String t, int lineNo) {
      final String[] kv = split(t, lineNo);
      if (!kv[0].equals("CCSDS_OEM_VERS")) {
        throw new TrajectoryFormatException(name, lineNo, "CCSDS_OEM_VERS must come first, found '" + kv[0] + "'");
      }
      if (!List.of("1.0", "2.0", "3.0").contains(kv[1])) {
        throw new TrajectoryFormatException(name, lineNo, "CCSDS_OEM_VERS: found '" + kv[1]
            + "', allowed 1.0, 2.0 or 3.0");
      }
      version = kv[1];
      state = State.HEADER;
    }

    private void headerDone(int lineNo) {
      for (String k : List.of("CREATION_DATE", "ORIGINATOR")) {
        if (!header.containsKey(k)) {
          throw new TrajectoryFormatException(name, lineNo, "header lacks " + k + " (required before META_START)");
        }
      }
      if (header.containsKey("MESSAGE_ID") && !version.equals("3.0")) {
        throw new TrajectoryFormatException(name, headerLines.get("MESSAGE_ID"), "MESSAGE_ID in an OEM of version "
            + version + ", allowed only in version 3.0");
      }
      final int line = headerLines.get("CREATION_DATE");
      Epochs.toTt(name, line, header.get("CREATION_DATE"), "UTC");
    }

    private void openSegment(int lineNo) {
      meta = new LinkedHashMap<>();
      metaLines = new LinkedHashMap<>();
      samples = new ArrayList<>();
      metaStart = lineNo;
      dataSeen = false;
      state = State.META;
    }

    private String[] split(String t, int lineNo) {
      final int eq = t.indexOf('=');
      if (eq < 0) {
        throw new TrajectoryFormatException(name, lineNo, "keyword line without '=', found '" + abbreviate(t) + "'");
      }
      final String key = t.substring(0, eq).strip();
      final String value = t.substring(eq + 1).strip();
      if (!KEY.matcher(key).matches()) {
        throw new TrajectoryFormatException(name, lineNo, "malformed keyword, found '" + abbreviate(key)
            + "', allowed upper-case letters, digits and '_'");
      }
      if (value.isEmpty()) {
        throw new TrajectoryFormatException(name, lineNo, key + ": empty value");
      }
      return new String[] {key, value};
    }

    private void keyValue(String t, int lineNo, Map<String, String> into, Map<String, Integer> at,
        List<String> allowed, String block) {
      final String[] kv = split(t, lineNo);
      if (!allowed.contains(kv[0])) {
        throw new TrajectoryFormatException(name, lineNo, "unknown " + block + " keyword '" + kv[0] + "', allowed "
            + String.join(", ", allowed));
      }
      if (into.containsKey(kv[0])) {
        throw new TrajectoryFormatException(name, lineNo, kv[0] + " given twice in one " + block + " block (first at "
            + "line " + at.get(kv[0]) + ")");
      }
      into.put(kv[0], kv[1]);
      at.put(kv[0], lineNo);
    }

    private void metaDone(int lineNo) {
      for (String k : META_REQUIRED) {
        if (!meta.containsKey(k)) {
          throw new TrajectoryFormatException(name, lineNo, "metadata lacks " + k + " (required before META_STOP)");
        }
      }
      timeSystem = Epochs.checkTimeSystem(name, metaLines.get("TIME_SYSTEM"), meta.get("TIME_SYSTEM"));
      frame = frame(meta.get("REF_FRAME"), metaLines.get("REF_FRAME"));
      final String centre = meta.get("CENTER_NAME").toUpperCase(Locale.ROOT);
      if (frame == Frame.EARTH_FIXED && !centre.equals("EARTH")) {
        throw new TrajectoryFormatException(name, metaLines.get("CENTER_NAME"), "CENTER_NAME " + meta.get("CENTER_NAME")
            + " with the Earth-fixed REF_FRAME " + meta.get("REF_FRAME") + ", allowed only EARTH");
      }
      if (meta.containsKey("REF_FRAME_EPOCH")) {
        Epochs.toTt(name, metaLines.get("REF_FRAME_EPOCH"), meta.get("REF_FRAME_EPOCH"), timeSystem);
      }
      if (meta.containsKey("INTERPOLATION")) {
        final String method = meta.get("INTERPOLATION").toUpperCase(Locale.ROOT);
        if (!List.of("HERMITE", "LAGRANGE", "LINEAR").contains(method)) {
          throw new TrajectoryFormatException(name, metaLines.get("INTERPOLATION"), "INTERPOLATION: found '"
              + meta.get("INTERPOLATION") + "', allowed HERMITE, LAGRANGE or LINEAR");
        }
      }
      if (meta.containsKey("INTERPOLATION_DEGREE")) {
        TextFields.integer(name, metaLines.get("INTERPOLATION_DEGREE"), "INTERPOLATION_DEGREE",
            meta.get("INTERPOLATION_DEGREE"), 1, 32);
      }
      checkTimes();
      state = State.DATA;
    }

    private void checkTimes() {
      final SplitTime start = time("START_TIME");
      final SplitTime stop = time("STOP_TIME");
      startTt = start;
      stopTt = stop;
      order(start, stop, "STOP_TIME", "START_TIME");
      if (meta.containsKey("USEABLE_START_TIME")) {
        order(start, time("USEABLE_START_TIME"), "USEABLE_START_TIME", "START_TIME");
      }
      if (meta.containsKey("USEABLE_STOP_TIME")) {
        order(time("USEABLE_STOP_TIME"), stop, "STOP_TIME", "USEABLE_STOP_TIME");
        if (meta.containsKey("USEABLE_START_TIME")) {
          order(time("USEABLE_START_TIME"), time("USEABLE_STOP_TIME"), "USEABLE_STOP_TIME", "USEABLE_START_TIME");
        }
      }
      if (!segments.isEmpty()) {
        final Segment prev = segments.get(segments.size() - 1);
        final SplitTime prevStop = Epochs.toTt(name, prev.metadataLine("STOP_TIME"), prev.metadata("STOP_TIME"),
            prev.metadata("TIME_SYSTEM"));
        if (start.compareTo(prevStop) < 0) {
          throw new TrajectoryFormatException(name, metaLines.get("START_TIME"), "START_TIME " + meta.get("START_TIME")
              + " before the STOP_TIME of the previous segment (line " + prev.metadataLine("STOP_TIME")
              + "), allowed segments in time order without overlap");
        }
      }
    }

    private SplitTime time(String key) {
      return Epochs.toTt(name, metaLines.get(key), meta.get(key), timeSystem);
    }

    private void order(SplitTime early, SplitTime late, String lateKey, String earlyKey) {
      if (late.compareTo(early) < 0) {
        throw new TrajectoryFormatException(name, metaLines.get(lateKey), lateKey + " " + meta.get(lateKey)
            + " before " + earlyKey + " " + meta.get(earlyKey) + " (line " + metaLines.get(earlyKey) + ")");
      }
    }

    private Frame frame(String value, int lineNo) {
      final String f = value.toUpperCase(Locale.ROOT);
      if (ITRF.matcher(f).matches()) {
        return Frame.EARTH_FIXED;
      }
      return switch (f) {
        case "GCRF", "ICRF" -> Frame.GCRS;
        case "EME2000" -> Frame.EME2000;
        default -> throw new TrajectoryFormatException(name, lineNo, "REF_FRAME " + value
            + " not supported (Eigenzeit does not transform it), allowed " + FRAMES);
      };
    }

    private void dataOrNext(String t, int lineNo) {
      if (t.equals("META_START")) {
        closeSegment(lineNo);
        openSegment(lineNo);
      } else if (t.equals("COVARIANCE_START")) {
        if (version.equals("1.0")) {
          throw new TrajectoryFormatException(name, lineNo, "COVARIANCE_START in an OEM of version 1.0, allowed from "
              + "version 2.0 on");
        }
        covarianceStart = lineNo;
        covarianceRows = -1;
        state = State.COVARIANCE;
      } else if (t.equals("COVARIANCE_STOP") || t.equals("META_STOP")) {
        throw new TrajectoryFormatException(name, lineNo, t + " without its start line");
      } else if (t.contains("=")) {
        throw new TrajectoryFormatException(name, lineNo, "keyword line among the ephemeris lines, found '"
            + abbreviate(t) + "', allowed only ephemeris lines, COVARIANCE_START or META_START");
      } else {
        dataLine(t, lineNo);
      }
    }

    private void dataLine(String t, int lineNo) {
      if (covarianceStart > metaStart) {
        throw new TrajectoryFormatException(name, lineNo, "ephemeris line after the segment's covariance block "
            + "(line " + covarianceStart + "), allowed only META_START");
      }
      final String[] f = t.split("\\s+");
      if (f.length != 7 && f.length != 10) {
        throw new TrajectoryFormatException(name, lineNo,
            "ephemeris line needs an epoch and 6 (or 9) numbers, found " + (f.length - 1));
      }
      final SplitTime tt = Epochs.toTt(name, lineNo, f[0], timeSystem);
      final double[] p = new double[3];
      final double[] v = new double[3];
      for (int k = 0; k < 3; k++) {
        p[k] = TextFields.decimal(name, lineNo, "xyz".charAt(k) + " (km)", f[1 + k]) * 1e3;
        v[k] = TextFields.decimal(name, lineNo, "v" + "xyz".charAt(k) + " (km/s)", f[4 + k]) * 1e3;
        if (f.length == 10) {
          TextFields.decimal(name, lineNo, "a" + "xyz".charAt(k) + " (km/s^2)", f[7 + k]);
        }
      }
      if (!samples.isEmpty()) {
        final Sample prev = samples.get(samples.size() - 1);
        if (tt.compareTo(prev.epochTt()) <= 0) {
          throw new TrajectoryFormatException(name, lineNo, "epochs must increase, found " + f[0]
              + ", allowed after the epoch of line " + prev.line());
        }
      }
      if (tt.compareTo(startTt) < 0 || tt.compareTo(stopTt) > 0) {
        throw new TrajectoryFormatException(name, lineNo, "epoch " + f[0] + " outside the segment's START_TIME "
            + meta.get("START_TIME") + " .. STOP_TIME " + meta.get("STOP_TIME") + " (lines " + metaLines.get("START_TIME")
            + ", " + metaLines.get("STOP_TIME") + ")");
      }
      dataSeen = true;
      samples.add(new Sample(tt, p, v, lineNo));
    }

    private void covariance(String t, int lineNo) {
      if (t.equals("COVARIANCE_STOP")) {
        if (covarianceRows >= 0 && covarianceRows < 6) {
          throw new TrajectoryFormatException(name, lineNo, "covariance matrix incomplete: found " + covarianceRows
              + " rows, allowed 6");
        }
        state = State.DATA;
        return;
      }
      if (t.equals("META_START") || t.equals("META_STOP") || t.equals("COVARIANCE_START")) {
        throw new TrajectoryFormatException(name, covarianceStart, "COVARIANCE_START without COVARIANCE_STOP before "
            + t + " at line " + lineNo);
      }
      if (t.contains("=")) {
        covarianceKey(t, lineNo);
        return;
      }
      if (covarianceRows < 0 || covarianceRows >= 6) {
        throw new TrajectoryFormatException(name, lineNo, "covariance row without a preceding EPOCH line");
      }
      final String[] f = t.split("\\s+");
      if (f.length != covarianceRows + 1) {
        throw new TrajectoryFormatException(name, lineNo, "covariance row " + (covarianceRows + 1) + ": found "
            + f.length + " numbers, allowed " + (covarianceRows + 1) + " (lower triangle)");
      }
      for (int k = 0; k < f.length; k++) {
        final double c = TextFields.decimal(name, lineNo, "covariance element", f[k]);
        if (k == covarianceRows && c < 0) {
          throw new TrajectoryFormatException(name, lineNo, "covariance variance (diagonal): found " + f[k]
              + ", allowed 0 or more");
        }
      }
      covarianceRows++;
    }

    private void covarianceKey(String t, int lineNo) {
      final String[] kv = split(t, lineNo);
      if (kv[0].equals("EPOCH")) {
        if (covarianceRows >= 0 && covarianceRows < 6) {
          throw new TrajectoryFormatException(name, lineNo, "covariance matrix incomplete before this EPOCH: found "
              + covarianceRows + " rows, allowed 6");
        }
        Epochs.toTt(name, lineNo, kv[1], timeSystem);
        covarianceRows = 0;
      } else if (kv[0].equals("COV_REF_FRAME")) {
        if (covarianceRows != 0) {
          throw new TrajectoryFormatException(name, lineNo, "COV_REF_FRAME allowed only directly after EPOCH");
        }
        if (!List.of("RTN", "RSW", "TNW").contains(kv[1].toUpperCase(Locale.ROOT))) {
          frame(kv[1], lineNo);
        }
      } else {
        throw new TrajectoryFormatException(name, lineNo, "unknown covariance keyword '" + kv[0]
            + "', allowed EPOCH, COV_REF_FRAME");
      }
    }

    private void closeSegment(int lineNo) {
      if (samples.size() < 2) {
        throw new TrajectoryFormatException(name, lineNo, "segment of line " + metaStart + " has "
            + samples.size() + " ephemeris lines, allowed 2 or more");
      }
      if (!segments.isEmpty()) {
        final Segment prev = segments.get(segments.size() - 1);
        final Sample last = prev.samples().get(prev.samples().size() - 1);
        if (samples.get(0).epochTt().compareTo(last.epochTt()) < 0) {
          throw new TrajectoryFormatException(name, samples.get(0).line(), "first epoch of this segment before the "
              + "last epoch of the previous one (line " + last.line() + "), allowed segments without overlap");
        }
      }
      segments.add(new Segment(meta, metaLines, samples, frame, metaStart));
    }
  }

  private static String abbreviate(String l) {
    return l.length() <= 40 ? l : l.substring(0, 40) + "...";
  }

  /** @return the file name */
  public String name() {
    return name;
  }

  /** @return the segments, in file order */
  public List<Segment> segments() {
    return segments;
  }

  private Segment only() {
    if (segments.size() != 1) {
      throw new TrajectoryFormatException(name, segments.get(1).metaStartLine(), "the file has " + segments.size()
          + " segments, this use needs exactly one (see segments())");
    }
    return segments.get(0);
  }

  /**
   * A metadata value of a single-segment file.
   *
   * @param key keyword such as REF_FRAME
   * @return the value, or null
   * @throws TrajectoryFormatException when the file has more than one segment
   */
  public String metadata(String key) {
    return only().metadata(key);
  }

  /**
   * The ephemeris lines of a single-segment file.
   *
   * @return the lines, TT epochs
   * @throws TrajectoryFormatException when the file has more than one segment
   */
  public List<Sample> samples() {
    return only().samples();
  }

  /**
   * Whether a single-segment file is Earth-fixed.
   *
   * @return whether REF_FRAME is an ITRF frame
   * @throws TrajectoryFormatException when the file has more than one segment
   */
  public boolean isEarthFixed() {
    return only().frame() == Frame.EARTH_FIXED;
  }
}
