package org.eigenzeit.ground.uplink;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.ground.trajectory.TrajectoryFormatException;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.junit.jupiter.api.Test;

/**
 * The ground decoder of leap-seconds.list: the real file (tzdata 2026f), and each fault class of
 * the reliability issue, with the file's hash recomputed so that only the structure and content
 * checks can catch it. The hash rule (SHA-1 over the digits of #$, #@ and the first two fields of
 * each data line) is the format's, from the file's own header.
 */
class LeapSecondsListTest {
  static String real() throws IOException {
    try (InputStream in = Epochs.class.getResourceAsStream("leap-seconds.list")) {
      return new String(in.readAllBytes(), StandardCharsets.US_ASCII);
    }
  }

  /** The text with its #h line recomputed from its own digits (the test's own SHA-1 of the rule). */
  static String rehash(String text) throws Exception {
    final StringBuilder d = new StringBuilder();
    final Matcher u = Pattern.compile("(?m)^#\\$\\s+(\\d+)").matcher(text);
    final Matcher e = Pattern.compile("(?m)^#@\\s+(\\d+)").matcher(text);
    assertTrue(u.find() && e.find());
    d.append(u.group(1)).append(e.group(1));
    final Matcher rows = Pattern.compile("(?m)^(\\d+)\\s+(\\d+)").matcher(text);
    while (rows.find()) {
      d.append(rows.group(1)).append(rows.group(2));
    }
    final byte[] sha = MessageDigest.getInstance("SHA-1").digest(d.toString().getBytes(StandardCharsets.US_ASCII));
    final StringBuilder h = new StringBuilder("#h\t");
    for (int i = 0; i < 5; i++) {
      h.append(String.format("%02x%02x%02x%02x ", sha[4 * i], sha[4 * i + 1], sha[4 * i + 2], sha[4 * i + 3]));
    }
    return text.replaceFirst("(?m)^#h.*$", h.toString().trim());
  }

  private static String refused(String text) {
    return assertThrows(UplinkInputException.class,
        () -> LeapSecondsList.read("leap.list", text.getBytes(StandardCharsets.ISO_8859_1))).getMessage();
  }

  private static int lineOf(String text, String start) {
    final String[] lines = text.split("\n", -1);
    for (int i = 0; i < lines.length; i++) {
      if (lines[i].startsWith(start)) {
        return i + 1;
      }
    }
    throw new IllegalArgumentException(start);
  }

  @Test
  void realFileDecodesToTheCoresImage() throws Exception {
    final LeapSecondsList l = LeapSecondsList.read("leap-seconds.list", real().getBytes(StandardCharsets.US_ASCII));
    assertEquals(28, l.size());
    assertEquals(4023129600L, l.expiryNtp(), "#@ of the file");
    final LeapSecondTable t = l.activeTable();
    assertEquals(28, t.size());
    assertArrayEquals(l.image(), LeapSecondsList.read("x", rehash(real()).getBytes(StandardCharsets.US_ASCII)).image(),
        "the test's recomputed hash equals the file's own");
  }

  @Test
  void refusesEveryFaultClassEvenWithARecomputedHash() throws Exception {
    final String real = real();
    final String earlyExpiry = rehash(real.replace("#@\t4023129600", "#@\t3992312600"));
    String m = refused(earlyExpiry);
    assertTrue(m.startsWith("leap.list:" + lineOf(earlyExpiry, "#@") + ": expiry"), m);
    m = refused(rehash(real.replace("2272060800      10      # 1 Jan 1972", "2272060800      15      # 1 Jan 1972")));
    assertTrue(m.contains("first entry") && m.contains("allowed 2272060800 (1972-01-01) with 10 s"), m);
    final String noon = rehash(real.replace("2287785600      11      # 1 Jul 1972", "2287828800      11      # 1 Jul 1972"));
    m = refused(noon);
    assertTrue(m.startsWith("leap.list:" + lineOf(noon, "2287828800") + ":") && m.contains("not at 00:00:00 UTC"), m);
    m = refused(rehash(real.replace("2303683200      12      # 1 Jan 1973", "2287785601      12")));
    assertTrue(m.contains("not at 00:00:00 UTC"), "1 s after the previous one: " + m);
    m = refused(rehash(real.replace("2303683200      12      # 1 Jan 1973", "2287785600      12")));
    assertTrue(m.contains("less than a calendar month after the previous one"), "the same instant twice: " + m);
    m = refused(rehash(real.replace("2303683200      12", "2303683200      13")));
    assertTrue(m.contains("allowed a step of exactly +1 or -1 s"), m);
  }

  @Test
  void aDigitMovedAcrossTheSeparatorKeepsTheHashButNotTheStructure() throws Exception {
    final String moved = real().replace("2272060800      10", "227206080      010");
    final String m = refused(moved);
    assertTrue(m.contains("NTP seconds '227206080', allowed NTP seconds of exactly 10 digits"), m);
    final String other = real().replace("2272060800      10", "22720608001      0");
    assertTrue(refused(other).contains("exactly 10 digits"));
    final String offset = real().replace("2287785600      11", "2287785600      011");
    assertTrue(refused(rehash(offset)).contains("TAI-UTC '011', allowed 1 to 3 digits without a leading zero"));
  }

  @Test
  void structureAndHashAreChecked() throws Exception {
    final String real = real();
    String m = refused(real.replace("3692217600      37", "3692217600      38"));
    assertTrue(m.startsWith("leap.list:" + lineOf(real, "#h") + ": hash word"), m);
    m = refused(real.replace("# 1 Jan 1974", "# 1 Jan 1975"));
    assertTrue(m.contains("comment date '1 Jan 1975' differs") && m.contains("allowed '1 Jan 1974'"), m);
    m = refused(real.replace("#@\t4023129600", "#@\t4023129600\n#@\t4023129600"));
    assertTrue(m.contains("second #@ line"), m);
    m = refused(real.replaceFirst("(?m)^#h.*$", ""));
    assertTrue(m.contains("missing #h line"), m);
    m = refused(real.replace("# 1 Jan 1980", "# 1 Jan 1980 \u00e9"));
    assertTrue(m.contains("byte 0xE9, allowed printable ASCII"), m);
    m = refused(real.replace("2524521600      19", "2524521600      19      7"));
    assertTrue(m.contains("data line with 3 fields"), m);
    m = refused(real.replaceFirst("(?m)^#h\\s+\\S+", "#h zz"));
    assertTrue(m.contains("#h word 'zz'"), m);
  }

  @Test
  void theGroundRefusesUtcEpochsAfterTheExpiry() {
    assertEquals(0L, Epochs.parse("2027-06-27T23:59:59", "UTC").secondsSince(Epochs.parse("2027-06-28T00:01:08.184",
        "TT")), 1e-9, "37 s + 32.184 s before the expiry");
    final TrajectoryFormatException e = assertThrows(TrajectoryFormatException.class,
        () -> Epochs.toTt("orbit.oem", 12, "2027-06-28T00:00:00", "UTC"));
    assertTrue(e.getMessage().startsWith("orbit.oem:12: UTC epoch '2027-06-28T00:00:00' at or after the expiry of "
        + "the leap-second table (LEAP_TABLE_EXPIRED): TAI - UTC is not known, allowed UTC epochs before 2027-06-28"),
        e.getMessage());
    assertEquals(0.0, Epochs.parse("2030-01-01T00:00:00", "TAI").secondsSince(Epochs.parse("2030-01-01T00:00:32.184",
        "TT")), 1e-9, "TAI needs no leap table");
  }
}
