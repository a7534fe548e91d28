package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.timescale.CalendarLabels;
import org.eigenzeit.ground.timescale.Centre;
import org.eigenzeit.ground.timescale.LunarTimeDefinition;
import org.eigenzeit.ground.timescale.TimeScale;
import org.eigenzeit.ground.timescale.TimeScaleConverter;
import org.eigenzeit.ground.timescale.TimeScaleRelations;
import org.eigenzeit.onboard.time.SplitTime;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit epoch}: one event's labels in every time scale. */
@Command(name = "epoch", mixinStandardHelpOptions = true,
    header = "One event's labels in every time scale.",
    description = {"Converts the labels of one event between UTC, TAI, TT, TCG, TDB, TCB, the GNSS system times "
        + "(GPS, GST, BDT: nominal offsets from TAI), TCL and TL. TDB, TCB, TCL and TL come from Eigenzeit's "
        + "numerical relations along JPL DE405 and exist for TDB 1999-12-24 to 2040-01-25 (outside, the other "
        + "scales are still printed); each row states its relation and its accuracy.",
      "",
      "Example:",
      "  eigenzeit epoch 2026-10-01T00:00:00 --from UTC --at moon"},
    sortOptions = false)
final class EpochCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @picocli.CommandLine.Parameters(index = "0", paramLabel = "EPOCH",
      description = "The labels: YYYY-MM-DDThh:mm:ss[.s], YYYY-DDDThh:mm:ss[.s] or JD<julian date> (required).")
  String epoch;

  @Option(names = "--from", defaultValue = "UTC", paramLabel = "SCALE",
      description = "Scale of EPOCH: UTC, TAI, TT, TCG, TDB, TCB, GPS, GST, BDT, TCL or TL (default ${DEFAULT-VALUE}).")
  String from;

  @Option(names = "--at", paramLabel = "PLACE", description = "Where the event lies: earth (geocentre) or moon (selenocentre) "
      + "(default: moon when --from is TCL or TL, else earth).")
  String at;

  @Option(names = "--to", defaultValue = "all", paramLabel = "SCALES",
      description = "Scales to print, comma-separated, or all (default ${DEFAULT-VALUE}).")
  String to;

  @Option(names = "--lunar-l", paramLabel = "L", description = "L_L of TL, above 0 and below 1e-9 (default: Eigenzeit's GM_M/(R_M c^2) = "
      + "3.1403e-11; the IAU has not fixed L_L, see docs/time-scales.md).")
  String lunarL;

  @Option(names = "--tl0-s", defaultValue = "0", paramLabel = "S",
      description = "TL - TT at 1977-01-01T00:00:32.184 TT apart from periodic terms, s, -1 to 1 (default ${DEFAULT-VALUE}).")
  String tl0;

  @Option(names = "--decimals", defaultValue = "9", paramLabel = "N",
      description = "Digits after the second's point, 0 to 12 (default ${DEFAULT-VALUE}).")
  String decimals;

  @Option(names = "--json", description = "Print JSON instead of the table.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    final TimeScale source = scale("--from", from);
    final Centre centre = at == null ? (source == TimeScale.TCL || source == TimeScale.TL ? Centre.MOON : Centre.EARTH)
        : centre(at);
    final Set<TimeScale> wanted = scales(to);
    final LunarTimeDefinition lunar = lunarDefinition(lunarL, tl0);
    final int digits = TextFields.integer("--decimals", 0, "decimals", decimals, 0, 12);
    final CalendarLabels.Parsed parsed = CalendarLabels.parse("EPOCH", epoch, source == TimeScale.UTC);
    final boolean needsEphemeris = source.needsEphemeris() || wanted.stream().anyMatch(TimeScale::needsEphemeris);
    final TimeScaleConverter converter = new TimeScaleConverter(needsEphemeris ? TimeScaleRelations.de405(lunar) : null,
        TimeScaleConverter.shippedLeapSeconds());
    final TimeScaleConverter.Converted c = converter.convert(source, parsed.labels(), parsed.leapSecond(), centre);
    final PrintWriter out = spec.commandLine().getOut();
    if (json) {
      out.println(BudgetCommand.mapper().writeValueAsString(toJson(source, centre, lunar, wanted, c, digits)));
    } else {
      printTable(out, source, centre, lunar, wanted, c, digits);
    }
    out.flush();
    return 0;
  }

  static TimeScale scale(String option, String text) {
    try {
      return TimeScale.valueOf(text.strip().toUpperCase(Locale.ROOT));
    } catch (IllegalArgumentException e) {
      throw new InputException(option, 0, "unknown time scale, found '" + text + "', allowed UTC, TAI, TT, TCG, TDB, TCB, "
          + "GPS, GST, BDT, TCL, TL");
    }
  }

  private static Centre centre(String text) {
    return switch (text.strip().toLowerCase(Locale.ROOT)) {
      case "earth" -> Centre.EARTH;
      case "moon" -> Centre.MOON;
      default -> throw new InputException("--at", 0, "unknown place, found '" + text + "', allowed earth or moon");
    };
  }

  private static Set<TimeScale> scales(String text) {
    if ("all".equalsIgnoreCase(text.strip())) {
      return EnumSet.allOf(TimeScale.class);
    }
    final Set<TimeScale> s = EnumSet.noneOf(TimeScale.class);
    for (String part : text.split(",", -1)) {
      s.add(scale("--to", part));
    }
    return s;
  }

  static LunarTimeDefinition lunarDefinition(String l, String tl0Text) {
    final double ll = l == null ? LunarTimeDefinition.DEFAULT.scaleRateL()
        : TextFields.decimal("--lunar-l", 0, "L_L", l, Double.MIN_NORMAL, 1e-9 * (1 - 1e-12));
    final double t0 = TextFields.decimal("--tl0-s", 0, "TL0, s", tl0Text, -1.0, 1.0);
    return new LunarTimeDefinition(ll, t0);
  }

  private static List<String[]> rows(Set<TimeScale> wanted, TimeScaleConverter.Converted c, int digits) {
    final List<String[]> rows = new ArrayList<>();
    for (TimeScale s : wanted) {
      final SplitTime t = c.labels().get(s);
      final String text = t == null ? "(outside " + (s == TimeScale.UTC ? "the leap-second table" : "the DE405 span") + ")"
          : CalendarLabels.format(t, digits, s == TimeScale.UTC && c.utcHeldInLeapSecond());
      rows.add(new String[] {s.name(), text, t == null ? "" : CalendarLabels.julianDate(t)});
    }
    return rows;
  }

  private static void printTable(PrintWriter out, TimeScale source, Centre centre, LunarTimeDefinition lunar,
      Set<TimeScale> wanted, TimeScaleConverter.Converted c, int digits) {
    out.printf(Locale.ROOT, "event at the %s, given in %s; TL with L_L = %.6e, TL0 = %s s; UTC table: %s%n",
        centre == Centre.EARTH ? "geocentre" : "selenocentre", source, lunar.scaleRateL(),
        Double.toString(lunar.tlMinusTtAtT0S()), c.utcStatus());
    for (String[] r : rows(wanted, c, digits)) {
      out.printf(Locale.ROOT, "  %-4s %-34s %s%n", r[0], r[1], r[2]);
    }
    out.println("relations and accuracy:");
    for (TimeScale s : wanted) {
      out.printf(Locale.ROOT, "  %-4s %s.%n       accuracy: %s.%n", s.name(), s.relation(), s.accuracy());
    }
    out.println(Caution.TEXT);
  }

  private static ObjectNode toJson(TimeScale source, Centre centre, LunarTimeDefinition lunar, Set<TimeScale> wanted,
      TimeScaleConverter.Converted c, int digits) {
    final ObjectNode root = BudgetCommand.mapper().createObjectNode();
    root.put("givenScale", source.name());
    root.put("event", centre == Centre.EARTH ? "geocentre" : "selenocentre");
    root.put("utcStatus", c.utcStatus());
    root.put("utcInLeapSecond", c.utcHeldInLeapSecond());
    root.putObject("lunarDefinition").put("scaleRateL", lunar.scaleRateL()).put("tlMinusTtAtT0S", lunar.tlMinusTtAtT0S());
    final ArrayNode scales = root.putArray("scales");
    final Map<TimeScale, SplitTime> labels = c.labels();
    for (TimeScale s : wanted) {
      final ObjectNode n = scales.addObject();
      final SplitTime t = labels.get(s);
      n.put("scale", s.name());
      if (t != null) {
        n.put("labels", CalendarLabels.format(t, digits, s == TimeScale.UTC && c.utcHeldInLeapSecond()));
        n.put("julianDate", CalendarLabels.julianDate(t));
        n.put("wholeSecondsSinceJ2000", t.wholeSeconds());
        n.put("fractionS", t.fractionS());
      } else {
        n.putNull("labels");
      }
      n.put("relation", s.relation());
      n.put("accuracy", s.accuracy());
    }
    root.put("caution", Caution.TEXT);
    return root;
  }
}
