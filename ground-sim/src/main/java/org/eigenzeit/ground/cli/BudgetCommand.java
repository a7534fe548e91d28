package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.budget.BudgetResult;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.eigenzeit.ground.trajectory.TrajectoryChecks;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.exception.MathRuntimeException;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code eigenzeit budget}: the relativistic budget of one orbit, core against reference. */
@Command(name = "budget", mixinStandardHelpOptions = true,
    header = "Relativistic budget of one orbit, core vs reference.",
    customSynopsis = {"eigenzeit budget ORBIT [OPTIONS]",
      "  ORBIT: --sma-km KM [--ecc E] [--inc-deg DEG] [--raan-deg DEG]",
      "           [--argp-deg DEG] [--anomaly-deg DEG]",
      "       | --state-km X,Y,Z,VX,VY,VZ | --trajectory FILE [--satellite ID]",
      "       | --body moon --surface-site LAT,LON,HEIGHT"},
    description = {"Quick relativistic budget of an orbit: mean fractional frequency against TT (or the lunar "
        + "scale), periodic peak-to-peak, each component, from the onboard core and from the ground reference, and "
        + "their difference.",
      "",
      "Give the orbit as Keplerian elements (--sma-km, --ecc, --inc-deg, ...), as an inertial state (--state-km "
          + "x,y,z,vx,vy,vz in km and km/s), or as a trajectory file (--trajectory: an SP3-c/d precise orbit with "
          + "--satellite, or a CCSDS OEM), whose epoch and span it takes.",
      "",
      "Two rates are shown: the end offset over the span, which carries the periodic eccentricity term when the "
          + "span is not whole orbits, and the secular rate, the mean of the smooth part.",
      "",
      "Ephemeris: the reference's Sun and Moon come from the shipped JPL DE405 extract, so epoch and span must lie "
          + "within 1999-12-24 to 2040-01-25 (refused otherwise: a budget is a reference figure and never falls "
          + "back to a lower-precision model). Closed-loop campaigns instead fall back to the onboard core's "
          + "low-precision Sun and Moon series outside their DE405 window and record which one they used "
          + "(thirdBodies in each run's summary.json).",
      "",
      "Examples:",
      "  eigenzeit budget --sma-km 26561.75 --ecc 0.01 --inc-deg 55 --span-h 24",
      "  eigenzeit budget --state-km 7000,0,0,0,7.546,0 --span-h 2",
      "  eigenzeit budget --trajectory igs15904.sp3 --satellite G05"},
    sortOptions = false)
final class BudgetCommand implements Callable<Integer> {
  @Spec
  picocli.CommandLine.Model.CommandSpec spec;

  static final class Elements {
    @Option(names = "--sma-km", required = true, paramLabel = "KM",
        description = "Semi-major axis, km: above the body's smallest orbit radius (Earth 6348.136, Moon 1725.151) "
            + "up to its largest (Earth 2000000, Moon 66000); the perigee radius a(1-e) must also stay above the "
            + "smallest (required with the elements; no default).")
    double smaKm;
    @Option(names = "--ecc", defaultValue = "0", paramLabel = "E",
        description = "Eccentricity, 0 to 0.99 (default ${DEFAULT-VALUE}).")
    double ecc;
    @Option(names = "--inc-deg", defaultValue = "0", paramLabel = "DEG",
        description = "Inclination, degrees, 0 to 180 (default ${DEFAULT-VALUE}).")
    double incDeg;
    @Option(names = "--raan-deg", defaultValue = "0", paramLabel = "DEG",
        description = "Right ascension of the ascending node, degrees, -360 to 360 (default ${DEFAULT-VALUE}).")
    double raanDeg;
    @Option(names = "--argp-deg", defaultValue = "0", paramLabel = "DEG",
        description = "Argument of perigee, degrees, -360 to 360 (default ${DEFAULT-VALUE}).")
    double argpDeg;
    @Option(names = "--anomaly-deg", defaultValue = "0", paramLabel = "DEG",
        description = "True anomaly at the epoch, degrees, -360 to 360 (default ${DEFAULT-VALUE}).")
    double anomalyDeg;
  }

  static final class OrbitInput {
    @ArgGroup(exclusive = false)
    Elements elements;
    @Option(names = "--state-km", split = ",", arity = "1", paramLabel = "X,Y,Z,VX,VY,VZ", hideParamSyntax = true,
        description = "Inertial state x,y,z,vx,vy,vz in km and km/s, six numbers separated by commas (GCRS; "
            + "Moon-centred ICRF axes for --body moon); radius within the body's range, speed below the speed "
            + "of light and 1.05 x escape speed. Instead of the elements (no default).")
    double[] stateKm;
    @Option(names = "--trajectory", paramLabel = "FILE",
        description = "Trajectory file instead of elements or state: SP3-c/d (with --satellite) or CCSDS OEM, "
            + "Earth-centred, plain or .gz; its first epoch is the start and its span the default span (--epoch, "
            + "--time-scale and --body moon are refused) (no default).")
    java.nio.file.Path trajectory;

    @Option(names = "--surface-site", split = ",", arity = "1", paramLabel = "LAT,LON,HEIGHT",
        description = "With --body moon: a clock fixed on the Moon instead of an orbit: selenographic latitude "
            + "[-90, 90] deg, east longitude [-180, 360] deg, height above the mean sphere (1737.151 km) [-12000, 12000] m, in DE405's "
            + "principal-axis frame (no default).")
    String[] surfaceSite;
  }

  @Option(names = "--satellite", paramLabel = "ID",
      description = "Satellite of an SP3 --trajectory, e.g. G05 (required with an SP3 file; no default).")
  String satellite;

  @Option(names = "--ut1-minus-utc-s", defaultValue = "0", paramLabel = "S",
      description = "UT1 - UTC for the Earth-fixed to inertial rotation of a --trajectory, s, -0.9 to 0.9 "
          + "(default ${DEFAULT-VALUE}).")
  double ut1MinusUtcS;

  @ArgGroup(exclusive = true, multiplicity = "1")
  OrbitInput orbit;

  @Option(names = "--body", defaultValue = "earth", paramLabel = "BODY",
      description = "Central body: earth or moon; the Moon's clock is referred to Eigenzeit's lunar scale TL and to TT "
          + "(default ${DEFAULT-VALUE}).")
  String body;

  @Option(names = "--epoch", defaultValue = "2026-10-01T00:00:00", paramLabel = "ISO",
      description = "Start epoch, YYYY-MM-DDThh:mm:ss[.s] or YYYY-DDDThh:mm:ss[.s], checked field by field (nothing "
          + "rolled over), refused with --trajectory; the span must lie within the "
          + "shipped DE405, 1999-12-24 to 2040-01-25 (default ${DEFAULT-VALUE}).")
  String epoch;

  @Option(names = "--time-scale", defaultValue = "TT", paramLabel = "SCALE",
      description = "Scale of --epoch: TT, TAI, GPS or UTC (UTC from 1972 to the leap-second table's expiry) "
          + "(default ${DEFAULT-VALUE}).")
  String timeScale;

  @Option(names = "--span-h", defaultValue = "24", paramLabel = "HOURS",
      description = "Span, hours, 0.1 to 240; with --trajectory at most the file's span (default ${DEFAULT-VALUE}; "
          + "with --trajectory the file's span).")
  double spanH;

  @Option(names = "--step-s", defaultValue = "10", paramLabel = "S",
      description = "Sample step of the onboard core, s, 1 to 600 and at most the span (default ${DEFAULT-VALUE}).")
  double stepS;

  @Option(names = "--degree", defaultValue = "0", paramLabel = "N",
      description = "Harmonic degree of the onboard core, 2 to 36, with --core-level harmonics only; 0 (default) "
          + "picks 36 below 3000 km altitude, else 8.")
  int degree;

  @Option(names = "--core-level", paramLabel = "LEVEL",
      description = "Onboard model level: point-mass, j2 or harmonics (default: harmonics for the Earth, j2 for the "
          + "Moon, which has no harmonics beyond J2 in the core).")
  String coreLevel;

  @Option(names = "--core-tides", defaultValue = "on", arity = "1", paramLabel = "on|off",
      description = "Onboard lunisolar tidal term: on or off (true or false also accepted) (default ${DEFAULT-VALUE}).")
  String coreTides;

  @Option(names = "--json", description = "Print machine-readable JSON instead of the table.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    final PrintWriter out = spec.commandLine().getOut();
    final CommandLine cl = spec.commandLine();
    final CentralBody cb = parseBody(cl, body);
    final CommandLine.ParseResult parsed = cl.getParseResult();
    if (orbit.surfaceSite != null) {
      return LunarBudgetOutput.surface(this, cb, out);
    }
    final ModelLevel level = level(cb);
    if (degree != 0) {
      OptionChecks.range(cl, "--degree", degree, 2, 36);
      if (level != ModelLevel.HARMONICS) {
        throw new ParameterException(cl, "--degree: applies to --core-level harmonics only, found "
            + "--degree " + degree + " with level " + level.name().toLowerCase(Locale.ROOT).replace('_', '-'));
      }
    }
    OptionChecks.range(cl, "--step-s", stepS, 1, 600);
    if (orbit.trajectory != null) {
      if (cb.centre() != CentralBody.CENTRE_EARTH || parsed.hasMatchedOption("--epoch")
          || parsed.hasMatchedOption("--time-scale")) {
        throw new ParameterException(cl,
            "--trajectory: takes its epoch and frame from the file, found --body moon, --epoch or --time-scale");
      }
      OptionChecks.range(cl, "--ut1-minus-utc-s", ut1MinusUtcS, -0.9, 0.9);
      final TrajectoryInput in = TrajectoryInput.read(orbit.trajectory, satellite, ut1MinusUtcS);
      final double span;
      if (parsed.hasMatchedOption("--span-h")) {
        OptionChecks.range(cl, "--span-h", spanH, 0.1, in.trajectory().spanS() / 3600);
        span = spanH * 3600;
      } else {
        span = in.trajectory().spanS();
      }
      if (stepS > span) {
        throw new ParameterException(cl, "--step-s: " + OptionChecks.format(stepS) + " s is longer than the span of "
            + OptionChecks.format(span) + " s, allowed at most the span");
      }
      final int deg = degree != 0 ? degree : BudgetAnalysis.recommendedDegree(cb, in.minRadiusM());
      final ModelConfig cfg = ModelConfig.builder().body(cb).level(level).degree(deg).tides(tides())
          .energyToleranceRel(2e-3).build();
      print(BudgetAnalysis.analyseTrajectory(in.label(), in.trajectory(), in.reference(), span, stepS, cfg), out);
      return 0;
    }
    if (satellite != null || parsed.hasMatchedOption("--ut1-minus-utc-s")) {
      throw new ParameterException(cl, "--satellite and --ut1-minus-utc-s: apply to --trajectory only");
    }
    final OrbitSpec spec0 = orbit(cb);
    OptionChecks.range(cl, "--span-h", spanH, 0.1, 240);
    if (stepS > spanH * 3600) {
      throw new ParameterException(cl, "--step-s: " + OptionChecks.format(stepS)
          + " s is longer than --span-h " + OptionChecks.format(spanH) + " h, allowed at most the span");
    }
    final SplitTime t0 = epoch();
    final int deg = degree != 0 ? degree : BudgetAnalysis.recommendedDegree(cb, spec0PerigeeRadius(spec0));
    final ModelConfig cfg = ModelConfig.builder().body(cb).level(level).degree(deg).tides(tides())
        .energyToleranceRel(2e-3).build();
    final BudgetResult r;
    try {
      r = BudgetAnalysis.analyse("budget", spec0, t0, spanH * 3600, stepS, cfg);
    } catch (MathRuntimeException e) {
      throw ExternalTrajectory.integrationFailure(orbit.stateKm != null ? "--state-km" : "--sma-km", 0, e);
    }
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

  private OrbitSpec orbit(CentralBody cb) {
    final CommandLine cl = spec.commandLine();
    if (orbit.stateKm != null) {
      if (orbit.stateKm.length != 6) {
        throw new ParameterException(cl, "--state-km: found " + orbit.stateKm.length + " numbers, allowed 6 "
            + "(x,y,z,vx,vy,vz in km and km/s, separated by commas)");
      }
      final double[] r = {orbit.stateKm[0] * 1e3, orbit.stateKm[1] * 1e3, orbit.stateKm[2] * 1e3};
      final double[] v = {orbit.stateKm[3] * 1e3, orbit.stateKm[4] * 1e3, orbit.stateKm[5] * 1e3};
      try {
        TrajectoryChecks.checkState("--state-km", 0, cb, r, v);
      } catch (InputException e) {
        throw new ParameterException(cl, e.getMessage());
      }
      return new OrbitSpec(cb, r, v);
    }
    final Elements e = orbit.elements;
    final double minKm = cb.minRadiusM() / 1e3;
    final double maxKm = cb.maxRadiusM() / 1e3;
    if (!(e.smaKm > minKm && e.smaKm <= maxKm)) {
      throw new ParameterException(cl, "--sma-km: out of range, found " + OptionChecks.format(e.smaKm)
          + ", allowed above " + OptionChecks.format(minKm) + " up to " + OptionChecks.format(maxKm) + " for the "
          + cb.name());
    }
    OptionChecks.range(cl, "--ecc", e.ecc, 0, 0.99);
    OptionChecks.range(cl, "--inc-deg", e.incDeg, 0, 180);
    OptionChecks.range(cl, "--raan-deg", e.raanDeg, -360, 360);
    OptionChecks.range(cl, "--argp-deg", e.argpDeg, -360, 360);
    OptionChecks.range(cl, "--anomaly-deg", e.anomalyDeg, -360, 360);
    if (!(e.smaKm * (1 - e.ecc) > minKm)) {
      throw new ParameterException(cl, "--ecc: perigee radius a(1-e) = " + OptionChecks.format(e.smaKm * (1 - e.ecc))
          + " km with --sma-km " + OptionChecks.format(e.smaKm) + ", allowed above " + OptionChecks.format(minKm)
          + " km for the " + cb.name());
    }
    return OrbitSpec.fromElements(cb, e.smaKm * 1e3, e.ecc, e.incDeg, e.raanDeg, e.argpDeg, e.anomalyDeg);
  }

  SplitTime epoch() {
    final CommandLine cl = spec.commandLine();
    OptionChecks.oneOf(cl, "--time-scale", timeScale, List.of("tt", "tai", "gps", "utc"));
    final SplitTime t0;
    try {
      t0 = Epochs.parse("--epoch", epoch, timeScale);
    } catch (InputException e) {
      throw new ParameterException(cl, e.getMessage());
    }
    final double jd0 = 2_451_545.0 + t0.toSecondsApprox() / 86_400.0;
    if (!ThirdBodies.de405().covers(jd0) || !ThirdBodies.de405().covers(jd0 + spanH / 24.0)) {
      throw new ParameterException(cl, "--epoch: " + epoch + " with --span-h " + OptionChecks.format(spanH)
          + " leaves the shipped DE405 span, allowed 1999-12-24 to 2040-01-25");
    }
    return t0;
  }

  private ModelLevel level(CentralBody cb) {
    final boolean earth = cb.centre() == CentralBody.CENTRE_EARTH;
    if (coreLevel == null) {
      return earth ? ModelLevel.HARMONICS : ModelLevel.J2;
    }
    final String l = OptionChecks.oneOf(spec.commandLine(), "--core-level", coreLevel,
        List.of("point-mass", "j2", "harmonics"));
    if (l.equals("harmonics") && !earth) {
      throw new ParameterException(spec.commandLine(), "--core-level: harmonics is not available for --body moon "
          + "(the onboard core has no lunar field beyond J2), allowed point-mass or j2");
    }
    return switch (l) {
      case "point-mass" -> ModelLevel.POINT_MASS;
      case "j2" -> ModelLevel.J2;
      default -> ModelLevel.HARMONICS;
    };
  }

  private boolean tides() {
    final String t = OptionChecks.oneOf(spec.commandLine(), "--core-tides", coreTides,
        List.of("on", "off", "true", "false"));
    return t.equals("on") || t.equals("true");
  }

  private static double spec0PerigeeRadius(OrbitSpec o) {
    return BudgetAnalysis.perigeeRadiusOf(o);
  }

  static CentralBody parseBody(CommandLine cl, String name) {
    return OptionChecks.oneOf(cl, "--body", name, List.of("earth", "moon")).equals("earth") ? CentralBody.EARTH
        : CentralBody.MOON;
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
