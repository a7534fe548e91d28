package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.HexFormat;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.timescale.CalendarLabels;
import org.eigenzeit.ground.timescale.Centre;
import org.eigenzeit.ground.timescale.LunarTimeDefinition;
import org.eigenzeit.ground.timescale.TimeScale;
import org.eigenzeit.ground.timescale.TimeScaleConverter;
import org.eigenzeit.ground.timescale.TimeScaleRelations;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.CucCodec;
import org.eigenzeit.onboard.time.SplitTime;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit cuc encode|decode}: CCSDS Unsegmented Time Codes with a given P-field. */
@Command(name = "cuc", mixinStandardHelpOptions = true,
    header = "CCSDS Unsegmented Time Code: encode or decode.",
    description = {"Encodes an epoch as a CCSDS Unsegmented Time Code (CCSDS 301.0-B-4 section 3.2) with a given "
        + "P-field, or decodes one, with the onboard core's codec. The code counts TAI seconds from 1958-01-01 "
        + "(Level 1, time code ID 001) or from an agency epoch (Level 2, ID 010).",
      "",
      "Examples:",
      "  eigenzeit cuc encode 2026-10-01T00:00:00 --from UTC --p-field 1E",
      "  eigenzeit cuc decode 1E7A2B3C4D8000"},
    subcommands = {CucCommand.Encode.class, CucCommand.Decode.class}, sortOptions = false)
final class CucCommand implements Runnable {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /** A P-field read: the layout it names. */
  record Layout(int coarse, int fine, int level, int octets) {}

  /** Reads a P-field of one or two octets (hex) and checks every bit it may hold. */
  static Layout pField(String option, byte[] b, int available) {
    if (available < 1) {
      throw new InputException(option, 0, "no P-field octet, allowed 1 or 2 octets");
    }
    final int p1 = b[0] & 0xFF;
    final int id = (p1 >>> 4) & 0x7;
    if (id != CucCodec.ID_LEVEL1_TAI_1958 && id != CucCodec.ID_LEVEL2_AGENCY) {
      throw new InputException(option, 0, String.format(Locale.ROOT,
          "time code ID %d%d%d in P-field octet 0x%02X is not CUC, allowed 001 (Level 1) or 010 (Level 2)",
          (id >> 2) & 1, (id >> 1) & 1, id & 1, p1));
    }
    int coarse = ((p1 >>> 2) & 0x3) + 1;
    int fine = p1 & 0x3;
    int octets = 1;
    if ((p1 & 0x80) != 0) {
      if (available < 2) {
        throw new InputException(option, 0, "the extension flag is set but the second P-field octet is missing");
      }
      final int p2 = b[1] & 0xFF;
      if ((p2 & 0x80) != 0 || (p2 & 0x03) != 0) {
        throw new InputException(option, 0, String.format(Locale.ROOT,
            "second P-field octet 0x%02X sets a further extension or a reserved bit, allowed 0xxxxx00", p2));
      }
      coarse += (p2 >>> 5) & 0x3;
      fine += (p2 >>> 2) & 0x7;
      octets = 2;
      if (coarse <= 4 && fine <= 3) {
        throw new InputException(option, 0, "the second P-field octet adds no octets; Eigenzeit's codec writes this "
            + "layout with one P-field octet, allowed " + String.format(Locale.ROOT, "%02X", p1 & 0x7F));
      }
    }
    return new Layout(coarse, fine, id == CucCodec.ID_LEVEL1_TAI_1958 ? 1 : 2, octets);
  }

  static byte[] hex(String option, String text) {
    final String t = text.strip().replace(" ", "");
    if (t.isEmpty() || t.length() % 2 != 0 || !t.matches("[0-9A-Fa-f]+") || t.length() > 2 * CucCodec.MAX_CODE_OCTETS) {
      throw new InputException(option, 0, "not an even number of hex digits, found '" + text + "', allowed 2 to "
          + 2 * CucCodec.MAX_CODE_OCTETS + " hex digits");
    }
    return HexFormat.of().parseHex(t);
  }

  /** The codec of a layout; Level 2 needs the agency epoch (TAI, whole seconds). */
  static CucCodec codec(Layout l, String agencyEpoch) {
    if (l.level() == 1) {
      if (agencyEpoch != null) {
        throw new InputException("--agency-epoch", 0, "given for a Level 1 code (epoch 1958-01-01 TAI), allowed only with Level 2");
      }
      return CucCodec.level1(l.coarse(), l.fine());
    }
    if (agencyEpoch == null) {
      throw new InputException("--agency-epoch", 0, "missing: a Level 2 code (time code ID 010) counts from an agency epoch");
    }
    final SplitTime e = CalendarLabels.parse("--agency-epoch", agencyEpoch, false).labels();
    if (e.fractionS() != 0.0) {
      throw new InputException("--agency-epoch", 0, "not a whole second, found '" + agencyEpoch + "'");
    }
    return CucCodec.level2(l.coarse(), l.fine(), -e.wholeSeconds());
  }

  static TimeScaleConverter converter(TimeScale scale) {
    return new TimeScaleConverter(scale.needsEphemeris() ? TimeScaleRelations.de405(LunarTimeDefinition.DEFAULT) : null,
        TimeScaleConverter.shippedLeapSeconds());
  }

  static ObjectNode describe(Layout l, byte[] code, SplitTime tai, TimeScaleConverter.Converted c, int digits) {
    final ObjectNode n = BudgetCommand.mapper().createObjectNode();
    n.put("pField", HexFormat.of().withUpperCase().formatHex(code, 0, l.octets()));
    n.put("code", HexFormat.of().withUpperCase().formatHex(code));
    n.put("level", l.level());
    n.put("coarseOctets", l.coarse());
    n.put("fineOctets", l.fine());
    n.put("resolutionS", Math.pow(256.0, -Math.min(l.fine(), 6)));
    n.put("tai", CalendarLabels.format(tai, digits, false));
    final SplitTime utc = c.labels().get(TimeScale.UTC);
    if (utc != null) {
      n.put("utc", CalendarLabels.format(utc, digits, c.utcHeldInLeapSecond()));
    }
    n.put("tt", CalendarLabels.format(c.labels().get(TimeScale.TT), digits, false));
    n.put("caution", Caution.TEXT);
    return n;
  }

  static void print(PrintWriter out, ObjectNode n, boolean json) throws JsonProcessingException {
    if (json) {
      out.println(BudgetCommand.mapper().writeValueAsString(n));
    } else {
      out.printf(Locale.ROOT, "code %s (P-field %s: Level %d, %d coarse + %d fine octets, resolution %s s)%n",
          n.get("code").asText(), n.get("pField").asText(), n.get("level").asInt(), n.get("coarseOctets").asInt(),
          n.get("fineOctets").asInt(), n.get("resolutionS").asText());
      out.printf(Locale.ROOT, "  TAI %s%n", n.get("tai").asText());
      if (n.has("utc")) {
        out.printf(Locale.ROOT, "  UTC %s%n", n.get("utc").asText());
      }
      out.printf(Locale.ROOT, "  TT  %s%n", n.get("tt").asText());
      out.println(Caution.TEXT);
    }
    out.flush();
  }

  /** Options of both subcommands. */
  static final class Shared {
    @Option(names = "--agency-epoch", paramLabel = "EPOCH",
        description = "Level 2 only: the agency epoch, TAI, a whole second in the forms of EPOCH (no default).")
    String agencyEpoch;

    @Option(names = "--decimals", defaultValue = "9", paramLabel = "N",
        description = "Digits printed after the second's point, 0 to 12 (default ${DEFAULT-VALUE}).")
    String decimals;

    @Option(names = "--json", description = "Print JSON instead of the table.")
    boolean json;

    int digits() {
      return TextFields.integer("--decimals", 0, "decimals", decimals, 0, 12);
    }
  }

  /** {@code eigenzeit cuc encode}. */
  @Command(name = "encode", mixinStandardHelpOptions = true,
      description = "Encodes an epoch (converted to TAI) with the layout its P-field names. Encoding truncates.")
  static final class Encode implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @picocli.CommandLine.Parameters(index = "0", paramLabel = "EPOCH",
        description = "The epoch: YYYY-MM-DDThh:mm:ss[.s], YYYY-DDDThh:mm:ss[.s] or JD<julian date> (required).")
    String epoch;

    @Option(names = "--from", defaultValue = "TAI", paramLabel = "SCALE",
        description = "Scale of EPOCH: UTC, TAI, TT, TCG, GPS, GST, BDT (or TDB, TCB, TCL, TL) (default ${DEFAULT-VALUE}).")
    String from;

    @Option(names = "--p-field", required = true, paramLabel = "HEX",
        description = "P-field, 2 or 4 hex digits (required), e.g. 1E: Level 1, 4 coarse + 2 fine octets.")
    String pField;

    @picocli.CommandLine.Mixin
    Shared shared;

    @Override
    public Integer call() throws Exception {
      final TimeScale scale = EpochCommand.scale("--from", from);
      final byte[] p = hex("--p-field", pField);
      final Layout l = pField("--p-field", p, p.length);
      if (p.length != l.octets()) {
        throw new InputException("--p-field", 0, "found " + p.length + " octets, the P-field names " + l.octets());
      }
      final int digits = shared.digits();
      final CucCodec codec = codec(l, shared.agencyEpoch);
      final CalendarLabels.Parsed parsed = CalendarLabels.parse("EPOCH", epoch, scale == TimeScale.UTC);
      final TimeScaleConverter conv = converter(scale);
      final TimeScaleConverter.Converted c = conv.convert(scale, parsed.labels(), parsed.leapSecond(), Centre.EARTH);
      final SplitTime tai = c.labels().get(TimeScale.TAI);
      final byte[] code = new byte[codec.codeOctets()];
      final int st = codec.encode(tai, code, 0);
      if (st != Status.OK) {
        throw new InputException("EPOCH", 0, "does not fit the code (" + Status.name(st) + "): " + l.coarse()
            + " coarse octets count 0 to 2^" + 8 * l.coarse() + " - 1 s from the code's epoch");
      }
      final SplitTime decoded = new SplitTime();
      final int back0 = codec.decode(code, 0, decoded);
      if (back0 != Status.OK) { // the code was just encoded by the same codec
        throw new IllegalStateException("the core refused the code it encoded: " + Status.name(back0));
      }
      final TimeScaleConverter.Converted back = conv.convert(TimeScale.TAI, decoded, false, Centre.EARTH);
      print(spec.commandLine().getOut(), describe(l, code, decoded, back, digits), shared.json);
      return 0;
    }
  }

  /** {@code eigenzeit cuc decode}. */
  @Command(name = "decode", mixinStandardHelpOptions = true,
      description = "Decodes a code (P-field then T-field, hex) to TAI, UTC and TT.")
  static final class Decode implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @picocli.CommandLine.Parameters(index = "0", paramLabel = "CODE",
        description = "The code in hex, P-field first (required), e.g. 1E7A2B3C4D8000.")
    String code;

    @Option(names = "--p-field", paramLabel = "HEX", description = "Expected P-field, 2 or 4 hex digits: refuse a code with another (no default).")
    String pField;

    @picocli.CommandLine.Mixin
    Shared shared;

    @Override
    public Integer call() throws Exception {
      final byte[] b = hex("CODE", code);
      final Layout l = pField("CODE", b, b.length);
      if (pField != null) {
        final byte[] expected = hex("--p-field", pField);
        final byte[] found = java.util.Arrays.copyOf(b, l.octets());
        if (!java.util.Arrays.equals(expected, found)) {
          throw new InputException("--p-field", 0, "the code's P-field is " + HexFormat.of().withUpperCase().formatHex(found)
              + ", expected " + HexFormat.of().withUpperCase().formatHex(expected));
        }
      }
      final int digits = shared.digits();
      final CucCodec codec = codec(l, shared.agencyEpoch);
      if (b.length != codec.codeOctets()) {
        throw new InputException("CODE", 0, "found " + b.length + " octets, the P-field names " + codec.codeOctets()
            + " (" + l.octets() + " P-field, " + l.coarse() + " coarse, " + l.fine() + " fine)");
      }
      final SplitTime tai = new SplitTime();
      final int st = codec.decode(b, 0, tai);
      if (st != Status.OK) {
        throw new InputException("CODE", 0, "refused by the codec: " + Status.name(st));
      }
      final TimeScaleConverter.Converted c = converter(TimeScale.TAI).convert(TimeScale.TAI, tai, false, Centre.EARTH);
      print(spec.commandLine().getOut(), describe(l, b, tai, c, digits), shared.json);
      return 0;
    }
  }
}
