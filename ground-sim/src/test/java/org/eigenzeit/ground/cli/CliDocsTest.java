package org.eigenzeit.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * The command line's help and docs/cli.md come from one source, the picocli model: the option
 * tables of docs/cli.md are generated from the options' help lines and this test fails when the
 * checked-in file differs (regenerate with {@code -Deigenzeit.regenerateCliDocs=true}, see the
 * end of docs/cli.md). It also checks that every option's help states its default, that every
 * numeric option's stated range is the one the code validates (by giving values just outside it),
 * and that the help reads well at 80 columns.
 */
final class CliDocsTest {
  static final Path DOC = Path.of("..", "docs", "cli.md");
  static final String BEGIN = "<!-- generated: options of eigenzeit %s (CliDocsTest; edit the option descriptions"
      + " in ground-sim, then regenerate) -->";
  static final String END = "<!-- end of generated options -->";
  static final String REGENERATE = "mvn -B -ntp -pl ground-sim -am test -Dtest=CliDocsTest "
      + "-Dsurefire.failIfNoSpecifiedTests=false -Deigenzeit.regenerateCliDocs=true";

  /** Every command with options of its own (not the help command, not a pure group), by qualified name. */
  static Map<String, CommandSpec> commands() {
    final Map<String, CommandSpec> all = new LinkedHashMap<>();
    walk(Main.commandLine(), all);
    return all;
  }

  private static void walk(CommandLine cl, Map<String, CommandSpec> all) {
    final CommandSpec s = cl.getCommandSpec();
    final boolean own = !s.positionalParameters().isEmpty()
        || s.options().stream().anyMatch(o -> !o.usageHelp() && !o.versionHelp());
    if (own) {
      all.put(s.qualifiedName().replaceFirst("^eigenzeit ", ""), s);
    }
    for (CommandLine sub : cl.getSubcommands().values()) {
      if (!sub.getCommandName().equals("help") && sub.getParent() == cl) {
        walk(sub, all);
      }
    }
  }

  static List<ArgSpec> args(CommandSpec s) {
    final List<ArgSpec> a = new ArrayList<>(s.positionalParameters());
    for (OptionSpec o : s.options()) {
      if (!o.usageHelp() && !o.versionHelp()) {
        a.add(o);
      }
    }
    return a;
  }

  static String label(ArgSpec a) {
    if (a instanceof OptionSpec o) {
      final boolean flag = o.arity().max() == 0;
      return String.join(", ", o.names()) + (flag ? "" : " " + o.paramLabel());
    }
    final PositionalParamSpec p = (PositionalParamSpec) a;
    return p.paramLabel() + (p.arity().max() > 1 ? "..." : "");
  }

  static String description(ArgSpec a) {
    return String.join(" ", a.description());
  }

  /** The option table of one command, rendered from its picocli model. */
  static String table(CommandSpec s) {
    final StringBuilder b = new StringBuilder("| option | meaning, range, default |\n|---|---|\n");
    for (ArgSpec a : args(s)) {
      b.append("| `").append(label(a).replace("|", "\\|")).append("` | ").append(description(a).replace("|", "\\|")).append(" |\n");
    }
    return b.toString();
  }

  /** docs/cli.md with every generated block replaced by the current model's table. */
  static String generate(String doc) {
    String out = doc;
    final Map<String, CommandSpec> cmds = commands();
    for (Map.Entry<String, CommandSpec> e : cmds.entrySet()) {
      final String begin = String.format(BEGIN, e.getKey());
      final int i = out.indexOf(begin);
      assertTrue(i >= 0, "docs/cli.md has no option table for 'eigenzeit " + e.getKey() + "': add a section with the "
          + "line\n" + begin + "\n" + END + "\nand regenerate: " + REGENERATE);
      assertEquals(-1, out.indexOf(begin, i + 1), "two option tables for " + e.getKey());
      final int j = out.indexOf(END, i);
      assertTrue(j > i, "docs/cli.md: no end marker after " + begin);
      out = out.substring(0, i + begin.length()) + "\n" + table(e.getValue()) + out.substring(j);
    }
    final Matcher m = Pattern.compile("<!-- generated: options of eigenzeit ([a-z -]+?) \\(").matcher(out);
    while (m.find()) {
      assertTrue(cmds.containsKey(m.group(1)), "docs/cli.md has an option table for 'eigenzeit " + m.group(1)
          + "', which is no command (commands: " + cmds.keySet() + ")");
    }
    return out;
  }

  @Test
  void docsOptionTablesAreTheHelpOfEachCommand() throws IOException {
    final String doc = Files.readString(DOC, StandardCharsets.UTF_8);
    final String generated = generate(doc);
    if (System.getProperty("eigenzeit.regenerateCliDocs") != null) {
      Files.writeString(DOC, generated, StandardCharsets.UTF_8);
      System.out.println("regenerated " + DOC.toAbsolutePath().normalize());
      return;
    }
    assertEquals(generated, doc, "docs/cli.md's option tables differ from the commands' help; regenerate with: "
        + REGENERATE);
    System.out.println("evidence: cli-doc-commands = " + commands().size());
  }

  private static boolean numeric(ArgSpec a) {
    final Class<?> t = a.type();
    return t == double.class || t == Double.class || t == int.class || t == Integer.class || t == long.class
        || t == Long.class || t == double[].class;
  }

  /** Numeric options whose range is not one closed interval, with the reason. */
  private static final Map<String, String> OTHER_RANGES = Map.of(
      "budget --sma-km", "an open lower bound per body: 'above X up to Y'",
      "budget --state-km", "six numbers checked as one state (radius and speed), not one interval",
      "epoch --lunar-l", "open interval: 'above 0 and below 1e-9'");

  /**
   * Range checks: each numeric option, with the arguments that reach its check. The bounds are not
   * typed here: they are read from the option's help line and must be the ones the refusal names.
   */
  private static final Map<String, String[]> RANGE_CALLS = new LinkedHashMap<>();

  static {
    for (String o : List.of("--ecc", "--inc-deg", "--raan-deg", "--argp-deg", "--anomaly-deg", "--span-h", "--step-s",
        "--degree")) {
      RANGE_CALLS.put("budget " + o, new String[] {"budget", "--sma-km", "7000"});
    }
    RANGE_CALLS.put("budget --ut1-minus-utc-s", new String[] {"budget", "--trajectory", "absent.sp3"});
    RANGE_CALLS.put("demo --span-h", new String[] {"demo"});
    RANGE_CALLS.put("demo --seeds", new String[] {"demo"});
    RANGE_CALLS.put("campaign --seeds", new String[] {"campaign", "absent.yaml"});
    RANGE_CALLS.put("campaign --threads", new String[] {"campaign", "absent.yaml"});
    RANGE_CALLS.put("campaign --seed-from", new String[] {"campaign", "absent.yaml", "--seed-count", "1"});
    RANGE_CALLS.put("campaign --seed-count", new String[] {"campaign", "absent.yaml", "--seed-from", "0"});
    RANGE_CALLS.put("gnss-terms --step-s", new String[] {"gnss-terms", "--sp3", "absent.sp3"});
    RANGE_CALLS.put("gnss-terms --ut1-minus-utc-s", new String[] {"gnss-terms", "--sp3", "absent.sp3"});
    RANGE_CALLS.put("epoch --tl0-s", new String[] {"epoch", "2026-10-01T00:00:00"});
    RANGE_CALLS.put("epoch --decimals", new String[] {"epoch", "2026-10-01T00:00:00"});
    RANGE_CALLS.put("cuc encode --decimals", new String[] {"cuc", "encode", "2026-10-01T00:00:00", "--p-field", "1E"});
    RANGE_CALLS.put("cuc decode --decimals", new String[] {"cuc", "decode", "1E7A2B3C4D8000"});
    RANGE_CALLS.put("reference-speed --repeats", new String[] {"reference-speed"});
  }

  private static final Pattern RANGE = Pattern.compile("(-?\\d+(?:\\.\\d+)?(?:e-?\\d+)?) to (-?\\d+(?:\\.\\d+)?(?:e-?\\d+)?)");
  private static final Pattern DEFAULT = Pattern.compile("\\((?:[^()]*; )?(default|required|no default)[ :;)]");

  @Test
  void everyOptionStatesItsDefaultAndEveryNumericOneItsRange() {
    final List<String> missing = new ArrayList<>();
    int checked = 0;
    for (Map.Entry<String, CommandSpec> e : commands().entrySet()) {
      for (ArgSpec a : args(e.getValue())) {
        final String key = e.getKey() + " " + (a instanceof OptionSpec o ? o.longestName() : a.paramLabel());
        final String d = description(a);
        final boolean flag = a instanceof OptionSpec o && o.arity().max() == 0;
        if (!flag && !DEFAULT.matcher(d).find()) {
          missing.add(key + ": no '(default ...)', '(required ...)' or '(no default)' in: " + d);
        }
        if (d.contains("${") || (a.paramLabel().startsWith("<") && !flag)) {
          missing.add(key + ": unrendered variable or picocli's field-name label " + a.paramLabel());
        }
        final boolean ranged = numeric(a) || RANGE_CALLS.containsKey(key);
        if (ranged && !OTHER_RANGES.containsKey(key)) {
          if (!RANGE.matcher(d).find()) {
            missing.add(key + ": a numeric option without 'A to B' in its help: " + d);
          }
          if (!RANGE_CALLS.containsKey(key)) {
            missing.add(key + ": a numeric option whose range this test does not exercise (add it to RANGE_CALLS)");
          }
        }
        checked++;
      }
    }
    assertEquals(List.of(), missing);
    System.out.println("evidence: cli-options-checked = " + checked);
  }

  @Test
  void helpRangesAreTheValidatedRanges() {
    final Map<String, CommandSpec> cmds = commands();
    final List<String> wrong = new ArrayList<>();
    for (Map.Entry<String, String[]> e : RANGE_CALLS.entrySet()) {
      final String key = e.getKey();
      final int space = key.lastIndexOf(' ');
      final CommandSpec cmd = cmds.get(key.substring(0, space));
      final String option = key.substring(space + 1);
      final Matcher help = RANGE.matcher(description(cmd.findOption(option)));
      assertTrue(help.find(), key + ": no range in the help");
      final String stated = help.group();
      // Just outside: one for whole-number options, else half a unit (or 0.01 for fractional bounds).
      final Class<?> type = cmd.findOption(option).type();
      final boolean integer = type == int.class || type == Integer.class || type == String.class;
      final boolean whole = !help.group(1).contains(".") && !help.group(2).contains(".");
      final double step = integer ? 1 : whole ? 0.5 : 0.01;
      for (double v : new double[] {Double.parseDouble(help.group(1)) - step, Double.parseDouble(help.group(2)) + step}) {
        final List<String> call = new ArrayList<>(List.of(e.getValue()));
        call.add(option);
        call.add(OptionChecks.format(v));
        final String[] r = CliRunner.run(call.toArray(new String[0]));
        final Matcher refused = Pattern.compile("allowed .*?" + RANGE.pattern()).matcher(r[2]);
        if (!(Set.of("1", "2").contains(r[0]) && r[2].contains(option) && refused.find())) {
          wrong.add(String.join(" ", call) + ": not refused with a range (exit " + r[0] + "): " + r[2].strip());
        } else if (!(refused.group(1) + " to " + refused.group(2)).equals(stated)) {
          wrong.add(key + ": help says " + stated + ", the code allows " + refused.group(1) + " to " + refused.group(2));
        }
      }
    }
    assertEquals(List.of(), wrong);
    System.out.println("evidence: cli-ranges-checked = " + RANGE_CALLS.size());
  }

  private static String usage(CommandSpec s, int width) {
    final CommandLine cl = Main.commandLine();
    CommandLine target = cl;
    for (String part : s.qualifiedName().replaceFirst("^eigenzeit ?", "").split(" ")) {
      if (!part.isEmpty()) {
        target = target.getSubcommands().get(part);
      }
    }
    target.setUsageHelpAutoWidth(false);
    target.setUsageHelpWidth(width);
    return target.getUsageMessage(CommandLine.Help.Ansi.OFF);
  }

  @Test
  void helpReadsWellAtEightyColumns() {
    final List<String> bad = new ArrayList<>();
    final CommandLine root = Main.commandLine();
    final List<CommandSpec> all = new ArrayList<>(commands().values());
    all.add(root.getCommandSpec());
    all.add(root.getSubcommands().get("cuc").getCommandSpec());
    for (CommandSpec s : all) {
      final String[] lines = usage(s, 80).split("\n", -1);
      for (String l : lines) {
        if (l.length() > 80) {
          bad.add(s.qualifiedName() + ": line longer than 80 columns: " + l);
        }
      }
      for (String l : s.usageMessage().customSynopsis()) {
        if (l.length() > 72 || l.startsWith("Usage:")) {
          bad.add(s.qualifiedName() + ": custom synopsis line over 72 columns (it would wrap) or with its own 'Usage:': "
              + l);
        }
      }
      final String[] d = s.usageMessage().description();
      for (int k = 0; k + 1 < d.length; k++) {
        if (!d[k].isEmpty() && !d[k + 1].isEmpty() && !d[k + 1].startsWith("  ") && !d[k].matches(".*[.:]$")) {
          bad.add(s.qualifiedName() + ": description hard-wrapped mid-sentence after: " + d[k]);
        }
      }
      int synopsis = 0;
      for (String l : lines) {
        if (l.isEmpty() || !(l.startsWith("Usage:") || l.startsWith(" "))) {
          break;
        }
        synopsis++;
      }
      if (synopsis > 5) {
        bad.add(s.qualifiedName() + ": synopsis of " + synopsis + " lines, allowed 5");
      }
    }
    final String rootHelp = usage(root.getCommandSpec(), 80);
    final String commandsPart = rootHelp.substring(rootHelp.indexOf("Commands:"));
    for (String name : root.getSubcommands().keySet()) {
      final Matcher m = Pattern.compile("(?m)^  " + Pattern.quote(name) + " +(\\S.*)$").matcher(commandsPart);
      if (!m.find()) {
        bad.add("eigenzeit --help: command " + name + " not listed with a summary");
      } else if (!m.group(1).endsWith(".")) {
        bad.add("eigenzeit --help: the summary of " + name + " is cut: " + m.group(1));
      }
    }
    assertEquals(List.of(), bad);
  }
}
