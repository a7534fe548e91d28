package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.budget.BudgetResult;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.time.SplitTime;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code eigenzeit budget}: the relativistic budget of one orbit, core against reference. */
@Command(name = "budget", mixinStandardHelpOptions = true,
    description = {"Quick relativistic budget of an orbit: mean fractional frequency against TT (or the",
      "lunar scale), periodic peak-to-peak, each component, from the onboard core and from the",
      "ground reference, and their difference.",
      "",
      "Give the orbit as Keplerian elements (--sma-km, --ecc, --inc-deg, ...), as an inertial",
      "state (--state-km x,y,z,vx,vy,vz in km and km/s), or as a trajectory file (--trajectory: an",
      "SP3-c/d precise orbit with --satellite, or a CCSDS OEM), whose epoch and span it takes.",
      "",
      "Two rates are shown: the end offset over the span, which carries the periodic eccentricity",
      "term when the span is not whole orbits, and the secular rate, the mean of the smooth part.",
      "",
      "Example: eigenzeit budget --sma-km 26561.75 --ecc 0.01 --inc-deg 55 --span-h 24",
      "         eigenzeit budget --trajectory igs15904.sp3 --satellite G05"},
    sortOptions = false)
final class BudgetCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  static final class Elements {
    @Option(names = "--sma-km", required = true, description = "Semi-major axis, km.")
    double smaKm;
    @Option(names = "--ecc", defaultValue = "0", description = "Eccentricity (default ${DEFAULT-VALUE}).")
    double ecc;
    @Option(names = "--inc-deg", defaultValue = "0", description = "Inclination, degrees.")
    double incDeg;
    @Option(names = "--raan-deg", defaultValue = "0", description = "Right ascension of the ascending node, degrees.")
    double raanDeg;
    @Option(names = "--argp-deg", defaultValue = "0", description = "Argument of perigee, degrees.")
    double argpDeg;
    @Option(names = "--anomaly-deg", defaultValue = "0", description = "True anomaly at the epoch, degrees.")
    double anomalyDeg;
  }

  static final class OrbitInput {
    @ArgGroup(exclusive = false)
    Elements elements;
    @Option(names = "--state-km", split = ",", arity = "6",
        description = "Inertial state x,y,z,vx,vy,vz in km and km/s (GCRS; Moon-centred ICRF axes for --body moon).")
    double[] stateKm;
    @Option(names = "--trajectory", paramLabel = "FILE",
        description = "Trajectory file: SP3-c/d (with --satellite) or CCSDS OEM (Earth-centred); plain or .gz.")
    java.nio.file.Path trajectory;

    @Option(names = "--surface-site", split = ",", arity = "1", paramLabel = "LAT,LON,HEIGHT",
        description = "With --body moon: a clock fixed on the Moon instead of an orbit: selenographic latitude "
            + "[-90, 90] deg, east longitude [-180, 360] deg, height above the mean sphere [-12000, 12000] m (no default).")
    String[] surfaceSite;
  }

  @Option(names = "--satellite", description = "Satellite of an SP3 --trajectory, e.g. G05.")
  String satellite;

  @Option(names = "--ut1-minus-utc-s", defaultValue = "0",
      description = "UT1 - UTC for the Earth-fixed to inertial rotation of a --trajectory, s (default ${DEFAULT-VALUE}).")
  double ut1MinusUtcS;

  @ArgGroup(exclusive = true, multiplicity = "1")
  OrbitInput orbit;

  @Option(names = "--body", defaultValue = "earth", description = "Central body: earth or moon (default ${DEFAULT-VALUE}).")
  String body;

  @Option(names = "--epoch", defaultValue = "2026-10-01T00:00:00", description = "Start epoch, ISO (default ${DEFAULT-VALUE}).")
  String epoch;

  @Option(names = "--time-scale", defaultValue = "TT", description = "Scale of --epoch: TT, TAI, GPS or UTC (default ${DEFAULT-VALUE}).")
  String timeScale;

  @Option(names = "--span-h", defaultValue = "24", description = "Span, hours (default ${DEFAULT-VALUE}).")
  double spanH;

  @Option(names = "--step-s", defaultValue = "10", description = "Sample step of the onboard core, s (default ${DEFAULT-VALUE}).")
  double stepS;

  @Option(names = "--degree", defaultValue = "0",
      description = "Harmonic degree of the onboard core, 2..36; 0 (default) picks 36 below 3000 km altitude, else 8.")
  int degree;

  @Option(names = "--core-level", defaultValue = "harmonics",
      description = "Onboard model level: point-mass, j2 or harmonics (default ${DEFAULT-VALUE}; the Moon uses j2 at most).")
  String coreLevel;

  @Option(names = "--core-tides", defaultValue = "true", arity = "1",
      description = "Onboard lunisolar tidal term on or off (default ${DEFAULT-VALUE}).")
  boolean coreTides;

  @Option(names = "--json", description = "Print machine-readable JSON instead of the table.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    final PrintWriter out = spec.commandLine().getOut();
    final CentralBody cb = parseBody(body);
    if (orbit.surfaceSite != null) {
      return LunarBudgetOutput.surface(this, cb, out);
    }
    final picocli.CommandLine.ParseResult parsed = spec.commandLine().getParseResult();
    if (!(spanH > 0 && spanH <= 240) || !(stepS >= 1 && stepS <= 600) || (degree != 0 && degree < 2) || degree > 36) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(),
          "--span-h must be in (0, 240], --step-s in [1, 600], --degree 0 or in [2, 36]");
    }
    final ModelLevel level = switch (coreLevel.toLowerCase(Locale.ROOT)) {
      case "point-mass" -> ModelLevel.POINT_MASS;
      case "j2" -> ModelLevel.J2;
      case "harmonics" -> cb.centre() == CentralBody.CENTRE_EARTH ? ModelLevel.HARMONICS : ModelLevel.J2;
      default -> throw new picocli.CommandLine.ParameterException(spec.commandLine(),
          "--core-level must be point-mass, j2 or harmonics, not '" + coreLevel + "'");
    };
    if (orbit.trajectory != null) {
      if (cb.centre() != CentralBody.CENTRE_EARTH || parsed.hasMatchedOption("--epoch")
          || parsed.hasMatchedOption("--time-scale")) {
        throw new picocli.CommandLine.ParameterException(spec.commandLine(),
            "--trajectory takes its epoch and frame from the file: --body moon, --epoch and --time-scale do not apply");
      }
      if (!(Math.abs(ut1MinusUtcS) <= 0.9)) {
        throw new picocli.CommandLine.ParameterException(spec.commandLine(),
            "--ut1-minus-utc-s must be within [-0.9, 0.9] s (IERS keeps |UT1 - UTC| below 0.9 s), found " + ut1MinusUtcS);
      }
      final TrajectoryInput in = TrajectoryInput.read(orbit.trajectory, satellite, ut1MinusUtcS);
      final double span = parsed.hasMatchedOption("--span-h") ? spanH * 3600 : in.trajectory().spanS();
      final int deg = degree != 0 ? degree : BudgetAnalysis.recommendedDegree(cb, in.minRadiusM());
      final ModelConfig cfg = ModelConfig.builder().body(cb).level(level).degree(deg).tides(coreTides)
          .energyToleranceRel(2e-3).build();
      print(BudgetAnalysis.analyseTrajectory(in.label(), in.trajectory(), in.reference(), span, stepS, cfg), out);
      return 0;
    }
    if (satellite != null || parsed.hasMatchedOption("--ut1-minus-utc-s")) {
      throw new picocli.CommandLine.ParameterException(spec.commandLine(),
          "--satellite and --ut1-minus-utc-s apply to --trajectory only");
    }
    final OrbitSpec spec0 = orbit.stateKm != null
        ? new OrbitSpec(cb, new double[] {orbit.stateKm[0] * 1e3, orbit.stateKm[1] * 1e3, orbit.stateKm[2] * 1e3},
            new double[] {orbit.stateKm[3] * 1e3, orbit.stateKm[4] * 1e3, orbit.stateKm[5] * 1e3})
        : OrbitSpec.fromElements(cb, orbit.elements.smaKm * 1e3, orbit.elements.ecc, orbit.elements.incDeg,
            orbit.elements.raanDeg, orbit.elements.argpDeg, orbit.elements.anomalyDeg);
    final SplitTime t0 = Epochs.parse(epoch, timeScale);
    final int deg = degree != 0 ? degree : BudgetAnalysis.recommendedDegree(cb, spec0PerigeeRadius(spec0));
    final ModelConfig cfg = ModelConfig.builder().body(cb).level(level).degree(deg).tides(coreTides)
        .energyToleranceRel(2e-3).build();
    final BudgetResult r = BudgetAnalysis.analyse("budget", spec0, t0, spanH * 3600, stepS, cfg);
    if (cb.centre() == CentralBody.CENTRE_MOON) {
      LunarBudgetOutput.orbit(r, spec0, t0, spanH * 3600, stepS, cfg, json, out);
      out.flush();
      return 0;
    }
    print(r, out);
    return 0;
  }

  private void print(BudgetResult r, PrintWriter out) throws java.io.IOException {
    if (json) {
      out.println(mapper().writeValueAsString(r));
    } else {
      printTable(out, r);
      out.println(Caution.TEXT);
    }
    out.flush();
  }


  private static double spec0PerigeeRadius(OrbitSpec o) {
    return BudgetAnalysis.perigeeRadiusOf(o);
  }

  static CentralBody parseBody(String name) {
    return switch (name.toLowerCase(Locale.ROOT)) {
      case "earth" -> CentralBody.EARTH;
      case "moon" -> CentralBody.MOON;
      default -> throw new IllegalArgumentException("--body must be earth or moon, not '" + name + "'");
    };
  }

  static ObjectMapper mapper() {
    return new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
  }

  static void printTable(PrintWriter out, BudgetResult r) {
    final BudgetResult.Components c = r.components();
    out.printf(Locale.ROOT, "%s: %s orbit, clock against %s, span %.1f h%n", r.label(), r.body(), r.timeScale(), r.spanS() / 3600);
    out.printf(Locale.ROOT, "  %-28s %16s %16s %12s%n", "", "onboard core", "ground ref.", "core - ref");
    row(out, "secular rate (smooth part)", r.coreSecularRate(), r.referenceSecularRate());
    out.printf(Locale.ROOT, "  %-28s %16.6f %16.6f%n", "  as microseconds per day", r.coreSecularRate() * 86400e6,
        r.referenceSecularRate() * 86400e6);
    row(out, "end offset / span (mean y)", r.coreMeanRate(), r.referenceMeanRate());
    out.printf(Locale.ROOT, "  %-28s %16.6f %16.6f%n", "  as microseconds per day", r.coreMeanRate() * 86400e6,
        r.referenceMeanRate() * 86400e6);
    row(out, "kinematic -v^2/2c^2", c.kinematicCore(), c.kinematicReference());
    row(out, "gravitational -(GM/r-W0)/c^2", c.gravitationalCore(), c.gravitationalReference());
    row(out, "harmonics", c.harmonicsCore(), c.harmonicsReference());
    row(out, "tidal (third bodies)", c.tidalCore(), c.tidalReference());
    out.printf(Locale.ROOT, "  %-28s %16.4f %16.4f  ns%n", "periodic part, peak to peak", r.corePeriodicPeakToPeakS() * 1e9,
        r.referencePeriodicPeakToPeakS() * 1e9);
    out.printf(Locale.ROOT, "  %-28s %16.3f  ps (largest |core - ref| offset over the span)%n", "offset difference",
        r.maxOffsetDifferenceS() * 1e12);
  }

  private static void row(PrintWriter out, String name, double core, double ref) {
    out.printf(Locale.ROOT, "  %-28s %16.6e %16.6e %12.2e%n", name, core, ref, core - ref);
  }
}
