package org.eigenzeit.ground.trajectory;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reader of RINEX 2 GPS navigation files (Gurtner and Estey, "RINEX: The Receiver Independent
 * Exchange Format Version 2.11", 2007, Table A4): header up to "END OF HEADER", then 8-line
 * records of the PRN, the clock epoch and 29 broadcast parameters in D-exponent fields of 19
 * characters.
 *
 * <p>Immutable after parsing.
 */
public final class RinexNavFile {
  private final List<BroadcastEphemeris> records;

  private RinexNavFile(List<BroadcastEphemeris> records) {
    this.records = List.copyOf(records);
  }

  /**
   * Reads a file.
   *
   * @param path the file
   * @return the parsed records
   * @throws IOException when it cannot be read
   * @throws TrajectoryFormatException with the line number when malformed
   */
  public static RinexNavFile read(Path path) throws IOException {
    return parse(String.valueOf(path.getFileName()), Files.readAllLines(path, StandardCharsets.US_ASCII));
  }

  /**
   * Parses lines.
   *
   * @param name file name for messages
   * @param lines the lines
   * @return the parsed records
   */
  public static RinexNavFile parse(String name, List<String> lines) {
    if (lines.isEmpty() || lines.get(0).length() < 80 || !lines.get(0).substring(60).startsWith("RINEX VERSION")) {
      throw new TrajectoryFormatException(name, 1, "not a RINEX file: 'RINEX VERSION / TYPE' expected in columns 61-80");
    }
    final String version = lines.get(0).substring(0, 9).trim();
    if (!version.startsWith("2")) {
      throw new TrajectoryFormatException(name, 1, "RINEX version " + version + " not supported (2.x)");
    }
    if (lines.get(0).charAt(20) != 'N') {
      throw new TrajectoryFormatException(name, 1, "not a GPS navigation file (type '" + lines.get(0).charAt(20) + "')");
    }
    int i = 0;
    while (i < lines.size() && !(lines.get(i).length() >= 73 && lines.get(i).substring(60).startsWith("END OF HEADER"))) {
      i++;
    }
    if (i == lines.size()) {
      throw new TrajectoryFormatException(name, lines.size(), "no 'END OF HEADER' line");
    }
    i++;
    final List<BroadcastEphemeris> out = new ArrayList<>();
    while (i < lines.size()) {
      if (lines.get(i).isBlank()) {
        i++;
        continue;
      }
      if (i + 8 > lines.size()) {
        throw new TrajectoryFormatException(name, i + 1, "incomplete navigation record (8 lines expected)");
      }
      out.add(record(name, lines, i));
      i += 8;
    }
    return new RinexNavFile(out);
  }

  private static double field(String name, List<String> lines, int lineIdx, int k) {
    final String line = lines.get(lineIdx);
    final int start = 3 + 19 * k;
    if (line.length() < start + 19 && line.substring(Math.min(start, line.length())).isBlank()) {
      return 0.0;
    }
    final String s = line.substring(start, Math.min(line.length(), start + 19)).trim();
    if (s.isEmpty()) {
      return 0.0;
    }
    try {
      return Double.parseDouble(s.replace('D', 'E').replace('d', 'e'));
    } catch (NumberFormatException e) {
      throw new TrajectoryFormatException(name, lineIdx + 1, "unreadable number '" + s + "' in field " + (k + 1));
    }
  }

  private static BroadcastEphemeris record(String name, List<String> lines, int i) {
    final String first = lines.get(i);
    final int prn;
    final int[] cal = new int[5];
    final double sec;
    try {
      prn = Integer.parseInt(first.substring(0, 2).trim());
      final String[] f = first.substring(2, 22).trim().split("\\s+");
      for (int k = 0; k < 5; k++) {
        cal[k] = Integer.parseInt(f[k]);
      }
      sec = Double.parseDouble(f[5]);
    } catch (RuntimeException e) {
      throw new TrajectoryFormatException(name, i + 1, "unreadable PRN or epoch of navigation record");
    }
    final int year = cal[0] < 80 ? 2000 + cal[0] : 1900 + cal[0];
    final long days = CalendarMath.julianDayNumber(year, cal[1], cal[2]) - CalendarMath.julianDayNumber(1980, 1, 6);
    final double toc = ((days % 7) * 86_400.0) + cal[3] * 3600.0 + cal[4] * 60.0 + sec;
    final double[] p = new double[28];
    for (int l = 1; l <= 7; l++) {
      for (int k = 0; k < 4; k++) {
        if (4 * (l - 1) + k < 28) {
          p[4 * (l - 1) + k] = field(name, lines, i + l, k);
        }
      }
    }
    // p: 0 IODE, 1 Crs, 2 dn, 3 M0, 4 Cuc, 5 e, 6 Cus, 7 sqrtA, 8 toe, 9 Cic, 10 OMEGA0, 11 Cis,
    //    12 i0, 13 Crc, 14 omega, 15 OMEGADOT, 16 IDOT, 17 L2 codes, 18 week, 19 L2P, 20 accuracy,
    //    21 health, 22 TGD, 23 IODC, 24 transmission time, 25 fit interval
    if (!(p[7] > 4000 && p[7] < 6000) || !(p[5] >= 0 && p[5] < 0.1)) {
      throw new TrajectoryFormatException(name, i + 3, "sqrt(A) or eccentricity out of range for GPS");
    }
    return new BroadcastEphemeris(prn, toc, p[8], (int) p[18], p[7], p[5], p[3], p[2], p[10], p[12], p[14],
        p[15], p[16], p[4], p[6], p[13], p[1], p[9], p[11], (int) p[21]);
  }

  /** @return all records, in file order */
  public List<BroadcastEphemeris> records() {
    return records;
  }

  /**
   * The healthy record of a satellite whose toe is closest to an instant, within two hours.
   *
   * @param prn satellite number
   * @param secondsOfWeek GPS seconds of week
   * @return the record, or null when none is valid
   */
  public BroadcastEphemeris closest(int prn, double secondsOfWeek) {
    BroadcastEphemeris best = null;
    for (BroadcastEphemeris b : records) {
      if (b.prn() == prn && b.health() == 0 && Math.abs(b.tk(secondsOfWeek)) <= 7200
          && (best == null || Math.abs(b.tk(secondsOfWeek)) < Math.abs(best.tk(secondsOfWeek)))) {
        best = b;
      }
    }
    return best;
  }
}
