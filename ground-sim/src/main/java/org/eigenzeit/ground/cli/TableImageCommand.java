package org.eigenzeit.ground.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.scenario.ScenarioReader;
import org.eigenzeit.ground.uplink.TableSpec;
import org.eigenzeit.onboard.table.TableId;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code eigenzeit table-image}: the binary uplink image of one onboard table from a YAML specification. */
@Command(name = "table-image", mixinStandardHelpOptions = true,
    header = "Writes the binary uplink image of one onboard table.",
    description = {"Writes the onboard core's binary uplink image of one table (servo parameters, gravity "
        + "coefficients, leap seconds or the lunar time table TL - TT fitted along DE405) from a YAML specification (format in docs/cli.md), after the core's own "
        + "content rules have accepted it. Prints the table, its size and its CRC-32C.",
      "",
      "Example:",
      "  eigenzeit table-image servo.yaml --out servo.img"},
    sortOptions = false)
final class TableImageCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  @Parameters(index = "0", arity = "0..1", paramLabel = "SPEC.yaml",
      description = "The table specification; give it or --scenario (no default).")
  Path file;

  @Option(names = "--scenario", paramLabel = "SCENARIO.yaml",
      description = "Instead of a specification: the servo table a campaign scenario derives (no default).")
  Path scenario;

  @Option(names = "--out", required = true, paramLabel = "FILE", description = "The image file to write (required).")
  Path out;

  @Override
  public Integer call() throws IOException {
    if ((file == null) == (scenario == null)) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(), "SPEC.yaml or --scenario: give one, found "
          + (file == null ? "neither" : "both"));
    }
    final Path in = file != null ? file : scenario;
    if (!Files.isRegularFile(in)) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(), (file != null ? "SPEC.yaml" : "--scenario")
          + ": no such file '" + in + "', allowed an existing file");
    }
    final TableSpec.Image image = file != null ? TableSpec.read(file, TableImageCommand::lunarTable) : scenarioImage(scenario);
    final Path parent = out.toAbsolutePath().getParent();
    if (parent != null) {
      Files.createDirectories(parent);
    }
    Files.write(out, image.bytes());
    final PrintWriter w = spec.commandLine().getOut();
    w.printf(Locale.ROOT, "table %s: %d bytes, CRC-32C %08x, written to %s%n", TableId.name(image.tableId()),
        image.bytes().length, image.crc(), out);
    if (!image.detail().isEmpty()) {
      w.println(image.detail());
    }
    w.println(Caution.TEXT);
    w.flush();
    return 0;
  }

  /** The lunar time table of a span: TL - TT fitted along DE405 (LunarTableFitter), framed for the uplink. */
  private static TableSpec.Framed lunarTable(long startTtS, long spanS, double targetS, long tableId, double lunarL) {
    final org.eigenzeit.ground.timescale.TimeScaleConverter conv = org.eigenzeit.ground.timescale.TimeScaleConverter
        .shipped(new org.eigenzeit.ground.timescale.LunarTimeDefinition(lunarL, 0.0));
    final org.eigenzeit.ground.timescale.LunarTableFitter.Fit fit = new org.eigenzeit.ground.timescale.LunarTableFitter(conv)
        .choose(startTtS, spanS, targetS, tableId);
    return new TableSpec.Framed(org.eigenzeit.ground.uplink.LunarTableImage.frame(fit.image()), String.format(Locale.ROOT,
        "TL - TT from %d to %d s TT since J2000, degree %d, %d segment(s), stated accuracy %.3g ps (largest fit error "
            + "%.3g ps)", fit.startTtS(), fit.endTtS(), fit.degree(), fit.segments(), fit.accuracyS() * 1e12,
        fit.maxErrorS() * 1e12));
  }

  /** The servo table a scenario derives (its servo settings, oscillator and measurement plan). */
  private static TableSpec.Image scenarioImage(Path scenario) throws IOException {
    final Scenario sc = ScenarioReader.read(scenario);
    return TableSpec.servoImage(String.valueOf(scenario), sc.servo().tableValues(sc.oscillator(), sc.measurements()));
  }
}
