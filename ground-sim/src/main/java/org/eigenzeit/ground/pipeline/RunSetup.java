package org.eigenzeit.ground.pipeline;

import org.eigenzeit.ground.instant.Instants;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.SplittableRandom;
import java.util.function.DoubleUnaryOperator;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.ground.loop.LunarUplink;
import org.eigenzeit.ground.loop.RunPlan;
import org.eigenzeit.ground.timescale.LunarTableFitter;
import org.eigenzeit.ground.timescale.LunarTimeDefinition;
import org.eigenzeit.ground.timescale.TimeScaleConverter;
import org.eigenzeit.ground.uplink.LunarTableImage;
import org.eigenzeit.onboard.lunartime.LunarTimeTable;
import org.eigenzeit.ground.loop.TruthOrbit;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.ground.trajectory.ExternalTrajectory;
import org.eigenzeit.ground.trajectory.OemFile;
import org.eigenzeit.ground.trajectory.Sp3File;
import org.eigenzeit.ground.truth.OscillatorNoise;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelConfigBuilder;
import org.eigenzeit.onboard.relativity.ModelLevel;

/**
 * The setup step: a scenario and a seed become the loop's {@link RunPlan} (the core's configuration
 * and servo table, the truth orbit and proper time from the ground reference or an external file,
 * the free oscillator's phase), with no cycle run.
 *
 * <p>Deterministic: the run's random source is seeded from (scenario name, seed) by {@link #mix},
 * so the model-level variants of a scenario share their noise and a distributed engine can run
 * the same (scenario, seed) pairs unchanged.
 */
public final class RunSetup {
  /** Interpolation margin at each end of an external trajectory: five 15-minute SP3 steps, s. */
  static final double EXTERNAL_MARGIN_S = 5 * 900.0;

  private RunSetup() {}

  /**
   * A prepared run.
   *
   * @param plan the loop's plan
   * @param thirdBodies the truth's Sun and Moon source (and the trajectory file, if any)
   * @param orbitAtStart the truth's initial inertial state
   */
  public record Prepared(RunPlan plan, String thirdBodies, OrbitSpec orbitAtStart) {}

  /**
   * A reproducible seed from a scenario name and a run index.
   *
   * @param scenario scenario name
   * @param seed run index
   * @return the random seed
   */
  public static long mix(String scenario, long seed) {
    long h = 0x9E3779B97F4A7C15L * (seed + 1);
    for (int i = 0; i < scenario.length(); i++) {
      h = (h ^ scenario.charAt(i)) * 0xBF58476D1CE4E5B9L;
      h ^= h >>> 31;
    }
    return h;
  }

  /**
   * Prepares one run.
   *
   * @param sc the scenario
   * @param seed the Monte-Carlo seed
   * @return the plan and the truth's description
   */
  public static Prepared prepare(Scenario sc, long seed) {
    final SplittableRandom rnd = new SplittableRandom(mix(sc.name(), seed));
    final int cycle = sc.timing().cycleS();
    final org.eigenzeit.onboard.time.SplitTime t0;
    final TruthOrbit truth;
    final String third;
    final double spanS;
    if (sc.orbit().trajectory() != null) {
      final Scenario.ExternalOrbit ext = sc.orbit().trajectory();
      final ExternalTrajectory traj = external(ext, sc.timing().ut1MinusTtS());
      spanS = Math.min(sc.timing().spanS(), traj.spanS() - 2 * EXTERNAL_MARGIN_S);
      if (!(spanS > 0)) {
        throw new org.eigenzeit.ground.input.InputException(String.valueOf(ext.file().getFileName()), 0,
            String.format(java.util.Locale.ROOT, "trajectory of %.0f s is too short for a run of scenario %s, allowed "
            + "more than %.0f s (%.0f s of margin at each end)", traj.spanS(), sc.name(), 2 * EXTERNAL_MARGIN_S,
            EXTERNAL_MARGIN_S));
      }
      t0 = traj.t0Tt();
      Instants.shift(t0, EXTERNAL_MARGIN_S);
      final ThirdBodies tb = thirdBodiesFor(t0, spanS);
      final DoubleUnaryOperator tau = traj.properTimeModel(ReferenceConfig.earth(36).withThirdBodies(tb),
          spanS + EXTERNAL_MARGIN_S + cycle);
      final double tau0 = tau.applyAsDouble(EXTERNAL_MARGIN_S);
      truth = new TruthOrbit() {
        @Override
        public void state(double t, double[] r, double[] v) {
          traj.inertialState(t + EXTERNAL_MARGIN_S, r, v);
        }

        @Override
        public double properTimeOffsetS(double t) {
          return tau.applyAsDouble(t + EXTERNAL_MARGIN_S) - tau0;
        }
      };
      third = tb.source() + ", trajectory " + ext.file().getFileName();
    } else {
      spanS = sc.timing().spanS();
      t0 = Epochs.parse(sc.timing().epoch(), sc.timing().timeScale());
      final CentralBody body = sc.body();
      final OrbitSpec o = sc.orbit().elements().spec();
      final ThirdBodies tb = thirdBodiesFor(t0, spanS);
      final ReferenceConfig refCfg = (body.centre() == CentralBody.CENTRE_EARTH ? ReferenceConfig.earth(36)
          : ReferenceConfig.moon()).withThirdBodies(tb).withSurfaceForces(sc.orbit().srp(), sc.orbit().drag());
      final ReferenceTrajectory ref = new ReferencePropagator(refCfg).propagate(t0, o.position(), o.velocity(),
          spanS + cycle);
      truth = new TruthOrbit() {
        @Override
        public void state(double t, double[] r, double[] v) {
          ref.state(t, r, v);
        }

        @Override
        public double properTimeOffsetS(double t) {
          return ref.properTimeOffsetS(t);
        }
      };
      third = tb.source();
    }
    final OrbitSpec start = sc.orbit().elements() != null ? sc.orbit().elements().spec() : stateAtStart(truth);
    final int steps = (int) Math.floor(spanS / cycle);
    final double[] xOsc = OscillatorNoise.phase(sc.oscillator(), steps * cycle, rnd.nextLong());
    final RunPlan plan = new RunPlan(coreConfig(sc, start), !"none".equals(sc.model().level()),
        sc.servo().tableImage(sc.oscillator(), sc.measurements()), t0, cycle, steps,
        sc.body().centre() == CentralBody.CENTRE_EARTH, sc.timing().ut1MinusTtS(), truth, xOsc,
        sc.actuator().quantum(), sc.actuator().delayCycles(), sc.errors(), sc.measurements(),
        sc.timing().initialTimeErrorS(), Math.max(1, sc.timing().outputEveryS() / cycle), rnd,
        lunarUplink(sc, t0));
    return new Prepared(plan, third, start);
  }

  /** Table identifier the ground assigns to a run's lunar table. */
  static final long LUNAR_TABLE_ID = 0x4C54_0001L;
  /** Fit target of a run's lunar table, s (the fitter states twice the measured error). */
  static final double LUNAR_FIT_TARGET_S = 1.0e-12;

  /**
   * The lunar time table of a Moon-centred run: fitted by {@link LunarTableFitter} along DE405 over
   * the scenario's span (TT whole seconds; the run's start epoch is taken as TT for the table, as for
   * the truth's ephemeris), framed for the uplink (TableId.LUNAR_TIME) and damaged as the scenario says.
   */
  static LunarUplink lunarUplink(Scenario sc, org.eigenzeit.onboard.time.SplitTime t0) {
    final Scenario.LunarTable spec = sc.lunarTable();
    if (spec == null) {
      return null;
    }
    final TimeScaleConverter conv = TimeScaleConverter.shipped(new LunarTimeDefinition(sc.body().scaleRateL(), 0.0));
    final long start = t0.wholeSeconds() + Math.round(spec.startH() * 3600.0);
    final long span = Math.round(spec.spanH() * 3600.0);
    final LunarTableFitter.Fit fit;
    try {
      fit = new LunarTableFitter(conv).choose(start, span, LUNAR_FIT_TARGET_S, LUNAR_TABLE_ID);
    } catch (IllegalArgumentException e) {
      throw new org.eigenzeit.ground.scenario.ScenarioException(sc.name(), 0, "lunar_table", "no lunar table can be "
          + "fitted for the span", e.getMessage(), "a span inside DE405 (TDB 1999-12-24 to 2040-01-25), 1 h to 64 days");
    }
    byte[] image = null;
    if (!"absent".equals(spec.damage())) {
      image = LunarTableImage.frame(fit.image());
      if ("crc".equals(spec.damage())) {
        image[8 + LunarTimeTable.HEADER_BYTES + 5] ^= 0x08; // one coefficient bit; the CRC is not recomputed
      }
    }
    return new LunarUplink(image, fit.accuracyS(), fit.degree(), fit.segments(), fit.startTtS(), fit.endTtS(),
        spec.damage(), conv);
  }

  private static OrbitSpec stateAtStart(TruthOrbit truth) {
    final double[] r = new double[3];
    final double[] v = new double[3];
    truth.state(0, r, v);
    return new OrbitSpec(CentralBody.EARTH, r, v);
  }

  private static ExternalTrajectory external(Scenario.ExternalOrbit ext, double ut1MinusTtS) {
    try {
      return ext.format().equals("sp3") ? ExternalTrajectory.fromSp3(Sp3File.read(ext.file()), ext.satellite(), ut1MinusTtS)
          : ExternalTrajectory.fromOem(OemFile.read(ext.file()), ut1MinusTtS);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** DE405 where the shipped extract covers the run, else the core's low-precision series. */
  static ThirdBodies thirdBodiesFor(org.eigenzeit.onboard.time.SplitTime t0, double spanS) {
    final double jd0 = 2_451_545.0 + t0.toSecondsApprox() / 86_400.0;
    final ThirdBodies de = ThirdBodies.de405();
    // DE405 wherever the shipped file covers the whole run (1999-12-24 to 2040-01-25), else the
    // analytic series; the run's summary names the source used.
    return de.covers(jd0) && de.covers(jd0 + spanS / 86_400.0) ? de : ThirdBodies.analytic();
  }

  /** The core's model configuration for the scenario's level; the degree follows the orbit when 0. */
  static ModelConfig coreConfig(Scenario sc, OrbitSpec start) {
    final CentralBody body = sc.body();
    final ModelConfigBuilder b = ModelConfig.builder().body(body).energyToleranceRel(5e-3).maxSampleAgeS(60)
        .ut1MinusTtS(sc.timing().ut1MinusTtS());
    switch (sc.model().level()) {
      case "point-mass" -> b.level(ModelLevel.POINT_MASS).tides(false);
      case "j2" -> b.level(ModelLevel.J2).tides(false);
      default -> {
        if (body.centre() == CentralBody.CENTRE_EARTH) {
          final int deg = sc.model().degree() > 0 ? sc.model().degree()
              : BudgetAnalysis.recommendedDegree(body, BudgetAnalysis.perigeeRadiusOf(start));
          b.level(ModelLevel.HARMONICS).degree(deg).tides(true);
        } else {
          b.level(ModelLevel.J2).tides(true);
        }
      }
    }
    return b.build();
  }
}
