package org.eigenzeit.ground.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Strict field parsing. The oracle is the rule each method states: plain decimal notation only;
 * Java's parser, which these methods wrap, accepts every refused case below, so each assertion
 * fails if the strict check is removed.
 */
class TextFieldsTest {
  private static String refusal(Runnable r) {
    return assertThrows(InputException.class, r::run).getMessage();
  }

  @Test
  void firstNonBlankLineAfterAnEndMarker() {
    final List<String> lines = List.of("EOF", "", " \t", "x", "");
    assertEquals(3, TextFiles.firstNonBlank(lines, 1));
    assertEquals(3, TextFiles.firstNonBlank(lines, 3));
    assertEquals(-1, TextFiles.firstNonBlank(lines, 4));
    assertEquals(-1, TextFiles.firstNonBlank(lines, 5));
    assertEquals(0, TextFiles.firstNonBlank(lines, 0));
  }

  @Test
  void decimalsInEveryAllowedSpelling() {
    assertEquals(-1234.5, TextFields.decimal("f", 1, "x", " -1234.5 "), 0.0);
    assertEquals(0.25e-3, TextFields.decimal("f", 1, "x", "0.25D-03"), 0.0);
    assertEquals(0.5, TextFields.decimal("f", 1, "x", ".5"), 0.0);
    assertEquals(7.0, TextFields.decimal("f", 1, "x", "+7."), 0.0);
    assertEquals(3e10, TextFields.decimal("f", 1, "x", "3E10"), 0.0);
  }

  @Test
  void whatJavaAcceptsButADataFileMayNotHold() {
    for (String bad : List.of("NaN", "Infinity", "-Infinity", "0x1p3", "1.0d", "1f", "1e400", "", "1,5", "--1", "1e")) {
      final String m = refusal(() -> TextFields.decimal("orbit.sp3", 17, "x (km)", bad));
      assertTrue(m.startsWith("orbit.sp3:17: x (km): "), m);
    }
    assertTrue(refusal(() -> TextFields.decimal("f", 3, "e", "1.5", 0, 1)).contains("found 1.5, allowed 0 to 1"));
  }

  @Test
  void wholeNumbersRefuseFractionsAndRange() {
    assertEquals(-12, TextFields.integer("f", 1, "n", "-12", -100, 100));
    for (String bad : List.of("1.9", "1e3", "0x10", "", " ", "12345678901234567890")) {
      assertTrue(refusal(() -> TextFields.integer("s.yaml", 4, "seeds", bad, 1, 100)).startsWith("s.yaml:4: seeds: "));
    }
    assertTrue(refusal(() -> TextFields.integer("f", 1, "n", "101", -100, 100)).contains("allowed -100 to 100"));
  }

  @Test
  void calendarFieldsMustExist() {
    TextFields.checkCalendar("f", 1, 2016, 2, 29, 23, 59, 59.999, false);
    TextFields.checkCalendar("f", 1, 2016, 12, 31, 23, 59, 60.5, true);
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 2, 29, 0, 0, 0, false)).contains("day of month"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 13, 1, 0, 0, 0, false)).contains("month"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 4, 31, 0, 0, 0, false)).contains("day of month"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 1, 45, 0, 0, 0, false)).contains("day of month"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 1, 1, 25, 0, 0, false)).contains("hour"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 1, 1, 0, 60, 0, false)).contains("minute"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 1, 1, 0, 0, 75, false)).contains("seconds"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 1, 1, 12, 0, 60.0, true)).contains("seconds"));
    assertTrue(refusal(() -> TextFields.checkCalendar("f", 2, 2015, 1, 1, 23, 59, 60.0, false)).contains("seconds"));
    // Gregorian leap-year rule (common practice): 1900 is not a leap year, 2000 is.
    assertEquals(28, TextFields.daysInMonth(1900, 2));
    assertEquals(29, TextFields.daysInMonth(2000, 2));
  }

  @Test
  void nonAsciiBytesAreRefusedWithLineAndColumn() {
    final byte[] ok = "a\r\nb\n\nc".getBytes(StandardCharsets.US_ASCII);
    assertEquals(List.of("a", "b", "", "c"), TextFiles.asciiLines("f", ok));
    final byte[] bad = "line one\nli\u00e9ne".getBytes(StandardCharsets.UTF_8);
    assertEquals("f.oem:2: column 3: byte 0xC3 is not printable ASCII, allowed ASCII text only",
        refusal(() -> TextFiles.asciiLines("f.oem", bad)));
    final byte[] nul = {'a', 0, 'b'};
    assertTrue(refusal(() -> TextFiles.asciiLines("f", nul)).startsWith("f:1: column 2: byte 0x00"));
  }

  @Test
  void wholeDecimalsRefuseFractionsInsteadOfTruncating() {
    assertEquals(63, TextFields.wholeDecimal("n", 5, "health", "0.630000000000D+02", 0, 63));
    for (String bad : List.of("0.5", "NaN", "0.5D+00", "1e400", "64.0")) {
      final String m = refusal(() -> TextFields.wholeDecimal("n", 5, "health", bad, 0, 63));
      assertTrue(m.startsWith("n:5: health: "), m);
    }
    assertTrue(refusal(() -> TextFields.wholeDecimal("n", 5, "health", "0.5", 0, 63)).contains("not a whole number"));
    assertTrue(refusal(() -> TextFields.wholeDecimal("n", 5, "health", "64", 0, 63)).contains("allowed 0 to 63"));
  }

  @Test
  void fortranThreeDigitExponentsAreReadAsExponents() {
    // A real 2012 broadcast file carries 0.499063314480-269 in a spare field: 0.499063314480e-269.
    assertEquals(0.499063314480e-269, TextFields.fortranDecimal("n", 1, "spare", "0.499063314480-269"), 0.0);
    assertEquals(-1.5e120, TextFields.fortranDecimal("n", 1, "x", " -1.5+120 "), 0.0);
    assertEquals(2.5e-3, TextFields.fortranDecimal("n", 1, "x", "0.25D-02"), 1e-18);
    for (String bad : List.of("1.5-12", "0x1p3", "NaN", "1.5+9999", ".5-1000")) {
      assertTrue(refusal(() -> TextFields.fortranDecimal("n", 1, "x", bad)).startsWith("n:1: x: "), bad);
    }
  }

  @Test
  void columnsAreOneBasedInclusiveAndPadded() {
    assertEquals("bcd", TextFields.columns("abcdef", 2, 4));
    assertEquals("f  ", TextFields.columns("abcdef", 6, 8));
    assertEquals("   ", TextFields.columns("", 1, 3));
  }
}
