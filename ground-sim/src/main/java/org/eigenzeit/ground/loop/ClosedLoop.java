package org.eigenzeit.ground.loop;

import org.eigenzeit.ground.instant.Instants;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.eigenzeit.ground.budget.BudgetAnalysis;
import org.eigenzeit.ground.campaign.Scenario;
import org.eigenzeit.ground.ephemeris.ThirdBodies;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.ground.reference.ReferencePropagator;
import org.eigenzeit.ground.reference.ReferenceTrajectory;
import org.eigenzeit.ground.stats.Stability;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.ground.truth.Actuator;
import org.eigenzeit.ground.truth.EstimateErrors;
import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.ground.truth.OscillatorNoise;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelConfigBuilder;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.ServoMode;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.table.ServoParameters;
import org.eigenzeit.onboard.table.TableId;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.corrector.Housekeeping;
import org.eigenzeit.onboard.corrector.ClockCorrector;

/**
 * One closed-loop run: a pure function of (scenario, seed).
 *
 * <p>Truth: the orbit and the true proper-time offset Delta tau(t) from the ground reference
 * (DE405 Sun and Moon where covered, radiation pressure and drag as the scenario says); the free
 * oscillator's phase x_osc(t) from {@link OscillatorNoise}; the actuator's steering phase S(t)
 * (delay and quantum). The raw counter reads {@code C = TT + Delta tau + x_osc + S + x0}.
 *
 * <p>Onboard: a {@link ClockCorrector} with the steered counter ({@code counterIsSteered}), fed once
 * per cycle with the counter, an Earth-fixed orbit estimate (ITRS, as a GNSS receiver gives it;
 * inertial for the Moon) with the scenario's errors, and a time-offset measurement (corrected
 * time minus the true scale, plus noise, outages and outliers) as the measurement plan says.
 *
 * <p>Deterministic: every random draw comes from a SplittableRandom seeded from (scenario name,
 * seed), so a distributed engine can run the same (scenario, seed) pairs unchanged.
 */
public final class ClosedLoop {
  private ClosedLoop() {}

  /** The result and the time series of a run. */
  public record Output(RunResult result, TimeSeries series) {}

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
   * Runs one scenario with one seed.
   *
   * @param sc the scenario
   * @param seed the Monte-Carlo seed
   * @return the summary and the time series
   */
  public static Output run(Scenario sc, long seed) {
    // Seeded from the base name, so that a scenario's model-level variants share their noise.
    final int at = sc.name().indexOf('@');
    final SplittableRandom rnd = new SplittableRandom(mix(at < 0 ? sc.name() : sc.name().substring(0, at), seed));
    if (sc.trajectory() != null) {
      return runExternal(sc, seed, rnd);
    }
    final SplitTime t0 = Epochs.parse(sc.epoch(), sc.timeScale());
    final CentralBody body = sc.orbit().body();
    final ThirdBodies tb = thirdBodiesFor(t0, sc.spanS());
    final ReferenceConfig refCfg = (body.centre() == CentralBody.CENTRE_EARTH ? ReferenceConfig.earth(36)
        : ReferenceConfig.moon()).withThirdBodies(tb).withSurfaceForces(sc.srp(), sc.drag());
    final ReferenceTrajectory ref = new ReferencePropagator(refCfg).propagate(t0, sc.orbit().position(),
        sc.orbit().velocity(), sc.spanS() + sc.cycleS());
    final TruthOrbit truth = new TruthOrbit() {
      @Override
      public void state(double t, double[] r, double[] v) {
        ref.state(t, r, v);
      }

      @Override
      public double properTimeOffsetS(double t) {
        return ref.properTimeOffsetS(t);
      }
    };
    return run(sc, seed, rnd, t0, truth, tb.source());
  }

  /** A run whose truth orbit comes from an OEM or SP3 file (Earth, Lagrange-interpolated). */
  private static Output runExternal(Scenario sc, long seed, SplittableRandom rnd) {
    final Scenario.ExternalOrbit ext = sc.trajectory();
    final org.eigenzeit.ground.trajectory.ExternalTrajectory traj;
    try {
      traj = ext.format().equals("sp3")
          ? org.eigenzeit.ground.trajectory.ExternalTrajectory.fromSp3(
              org.eigenzeit.ground.trajectory.Sp3File.read(ext.file()), ext.satellite(), ext.ut1MinusTtS())
          : org.eigenzeit.ground.trajectory.ExternalTrajectory.fromOem(
              org.eigenzeit.ground.trajectory.OemFile.read(ext.file()), ext.ut1MinusTtS());
    } catch (java.io.IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
    final double margin = 5 * 900.0;
    final double span = Math.min(sc.spanS(), traj.spanS() - 2 * margin);
    if (!(span > 0)) {
      throw new IllegalArgumentException(sc.name() + ": the trajectory file is too short for a run");
    }
    final SplitTime t0 = traj.t0Tt();
    Instants.shift(t0, margin);
    final ThirdBodies tb = thirdBodiesFor(t0, span);
    final ReferenceConfig cfg = ReferenceConfig.earth(36).withThirdBodies(tb);
    final java.util.function.DoubleUnaryOperator tau = traj.properTimeModel(cfg, span + margin + sc.cycleS());
    final double tau0 = tau.applyAsDouble(margin);
    final TruthOrbit truth = new TruthOrbit() {
      @Override
      public void state(double t, double[] r, double[] v) {
        traj.inertialState(t + margin, r, v);
      }

      @Override
      public double properTimeOffsetS(double t) {
        return tau.applyAsDouble(t + margin) - tau0;
      }
    };
    final double[] r = new double[3];
    final double[] v = new double[3];
    truth.state(0, r, v);
    final Scenario withOrbit = new Scenario(sc.name(), sc.description(), span, sc.cycleS(), sc.epoch(), sc.timeScale(),
        new org.eigenzeit.ground.budget.OrbitSpec(CentralBody.EARTH, r, v), sc.srp(), sc.drag(), sc.oscillator(),
        sc.modelLevel(), sc.degree(), sc.errors(), sc.measurements(), sc.servo(), sc.actuatorQuantum(),
        sc.actuatorDelayCycles(), sc.initialTimeErrorS(), sc.seeds(), sc.outputEveryS(), null);
    return run(withOrbit, seed, rnd, t0, truth, tb.source() + ", trajectory " + ext.file().getFileName());
  }

  static ThirdBodies thirdBodiesFor(SplitTime t0, double spanS) {
    final double jd0 = 2_451_545.0 + t0.toSecondsApprox() / 86_400.0;
    final ThirdBodies de = ThirdBodies.de405();
    return jd0 > 2_460_660.0 && jd0 + spanS / 86_400.0 < 2_462_890.0 ? de : ThirdBodies.analytic();
  }

  private static ModelConfig coreConfig(Scenario sc) {
    final CentralBody body = sc.orbit().body();
    final ModelConfigBuilder b = ModelConfig.builder().body(body).energyToleranceRel(5e-3).maxSampleAgeS(60);
    switch (sc.modelLevel()) {
      case "point-mass" -> b.level(ModelLevel.POINT_MASS).tides(false);
      case "j2" -> b.level(ModelLevel.J2).tides(false);
      default -> {
        if (body.centre() == CentralBody.CENTRE_EARTH) {
          final int deg = sc.degree() > 0 ? sc.degree()
              : BudgetAnalysis.recommendedDegree(body, BudgetAnalysis.perigeeRadiusOf(sc.orbit()));
          b.level(ModelLevel.HARMONICS).degree(deg).tides(true);
        } else {
          b.level(ModelLevel.J2).tides(true);
        }
      }
    }
    return b.build();
  }

  /**
   * Runs with a given truth orbit (for external trajectories).
   *
   * @param sc scenario
   * @param seed seed
   * @param rnd the run's random source
   * @param t0 start epoch, TT
   * @param truth truth orbit and proper time
   * @param thirdBodies name of the truth's Sun and Moon source
   * @return the output
   */
  public static Output run(Scenario sc, long seed, SplittableRandom rnd, SplitTime t0, TruthOrbit truth,
      String thirdBodies) {
    final CentralBody body = sc.orbit().body();
    final boolean earth = body.centre() == CentralBody.CENTRE_EARTH;
    final boolean applyModel = !"none".equals(sc.modelLevel());
    // the raw-clock gate's bound: a cycle of up to 60 s plus the oscillator's own offset must pass
    final ClockCorrector tk = new ClockCorrector(coreConfig(sc), applyModel, true,
        Math.max(ClockCorrector.DEFAULT_MAX_RAW_STEP_S, 2.0 * sc.cycleS()));
    final byte[] table = new byte[ServoParameters.TABLE_BYTES];
    if (ServoParameters.encode(sc.servo(), table, 0) != Status.OK
        || tk.loadTable(TableId.SERVO, table, 0, table.length) != Status.OK || tk.activateTable(TableId.SERVO) != Status.OK) {
      final org.eigenzeit.onboard.table.TableStatus ts = new org.eigenzeit.onboard.table.TableStatus();
      final int item = tk.tableStatus(TableId.SERVO, ts) == Status.OK ? ts.lastFailedItem() : -1;
      throw new IllegalArgumentException(sc.name() + ": servo table refused: field " + item);
    }
    final int cycle = sc.cycleS();
    final int steps = (int) Math.floor(sc.spanS() / cycle);
    final double[] xOsc = OscillatorNoise.phase(sc.oscillator(), steps * cycle, rnd.nextLong());
    final Actuator actuator = new Actuator(sc.actuatorQuantum(), sc.actuatorDelayCycles());
    final EarthOrientation eo = new EarthOrientation(MathMode.FAST, CentralBody.EARTH.rotationRateRadPerS());
    final EstimateErrors err = sc.errors();
    final MeasurementPlan plan = sc.measurements();
    final OrbitSample sample = new OrbitSample();
    final TimeOffsetMeasurement meas = new TimeOffsetMeasurement();
    final SplitTime tt = new SplitTime();
    final SplitTime raw = new SplitTime();
    final SplitTime corrected = new SplitTime();
    final double[] r = new double[3];
    final double[] v = new double[3];
    final double[] re = new double[3];
    final double[] ve = new double[3];
    final double[] errorS = new double[steps + 1];
    final int every = Math.max(1, sc.outputEveryS() / cycle);
    final TimeSeries series = new TimeSeries(steps / every + 1);
    final Housekeeping hk = new Housekeeping();
    double settle = -1;
    for (int k = 0; k <= steps; k++) {
      final double t = (double) k * cycle;
      tt.setTo(t0);
      Instants.shift(tt, t);
      final double dtau = truth.properTimeOffsetS(t);
      raw.setTo(tt);
      Instants.shift(raw, dtau + xOsc[k * cycle] + actuator.phaseS() + sc.initialTimeErrorS());
      OrbitSample orbitIn = null;
      if (!inGap(err, t)) {
        truth.state(t, r, v);
        orbitIn = sample;
        if (earth) {
          eo.update(tt, -69.2);
          eo.positionToItrs(r, re);
          eo.velocityToItrs(re, v, ve);
          perturb(re, ve, err, rnd);
          sample.set(tt, OrbitSample.FRAME_BODY_FIXED, re[0], re[1], re[2], ve[0], ve[1], ve[2], true);
        } else {
          perturb(r, v, err, rnd);
          sample.set(tt, OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
        }
      }
      TimeOffsetMeasurement measIn = null;
      if (plan.due(t, cycle)) {
        tk.correctedTime(raw, corrected);
        double z = corrected.secondsSince(tt) + plan.sigmaS() * gaussian(rnd);
        if (plan.outlierProbability() > 0 && rnd.nextDouble() < plan.outlierProbability()) {
          z += (rnd.nextBoolean() ? 1 : -1) * plan.outlierS();
        }
        meas.set(corrected, plan.source(), z, true);
        measIn = meas;
      }
      final int verdict = tk.cycle(raw, orbitIn, measIn); // measurement verdicts are counted in housekeeping
      if (measIn == null && verdict != Status.OK) {
        throw new IllegalStateException(sc.name() + ": the onboard cycle was refused: " + Status.name(verdict));
      }
      tk.correctedTime(raw, corrected);
      errorS[k] = corrected.secondsSince(tt);
      tk.housekeeping(hk);
      if (settle < 0 && hk.mode() == ServoMode.TRACK) {
        settle = t;
      }
      actuator.step(hk.command(), cycle);
      if (k % every == 0 && k / every < series.size()) {
        series.row(k / every, t, errorS[k] * 1e9, hk.mode(), hk.command(), hk.phaseS() * 1e9, dtau * 1e6,
            hk.modelOffsetS() * 1e6, hk.orbitSolutionStatus());
      }
    }
    return new Output(summarise(sc, seed, errorS, cycle, settle, hk, truth, thirdBodies), series);
  }

  private static boolean inGap(EstimateErrors err, double t) {
    return err.gapEveryS() > 0 && err.gapLengthS() > 0 && (t % err.gapEveryS()) >= err.gapEveryS() - err.gapLengthS();
  }

  private static void perturb(double[] r, double[] v, EstimateErrors err, SplittableRandom rnd) {
    final double rn = Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]);
    for (int i = 0; i < 3; i++) {
      r[i] += err.positionNoiseM() * gaussian(rnd) + err.radialBiasM() * r[i] / rn;
      v[i] += err.velocityNoiseMPerS() * gaussian(rnd);
    }
    if (err.corruptProbability() > 0 && rnd.nextDouble() < err.corruptProbability()) {
      if (rnd.nextBoolean()) {
        r[rnd.nextInt(3)] = Double.NaN;
      } else {
        r[rnd.nextInt(3)] += 50_000.0;
      }
    }
  }

  static double gaussian(SplittableRandom rnd) {
    double u1 = rnd.nextDouble();
    while (u1 <= 0) {
      u1 = rnd.nextDouble();
    }
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * rnd.nextDouble());
  }

  private static RunResult summarise(Scenario sc, long seed, double[] errorS, int cycle, double settle,
      Housekeeping hk, TruthOrbit truth, String thirdBodies) {
    final int from = settle >= 0 ? (int) (settle / cycle) : 0;
    double max = 0;
    double sum2 = 0;
    double maxAll = 0;
    for (int k = 0; k < errorS.length; k++) {
      maxAll = Math.max(maxAll, Math.abs(errorS[k]));
      if (k >= from) {
        max = Math.max(max, Math.abs(errorS[k]));
        sum2 += errorS[k] * errorS[k];
      }
    }
    final int n = errorS.length - from;
    final double[] settled = java.util.Arrays.copyOfRange(errorS, from, errorS.length);
    final int lag = Math.max(1, 100 / cycle);
    double f2 = 0;
    int fn = 0;
    for (int k = lag; k < settled.length; k++) {
      final double f = (settled[k] - settled[k - lag]) / (lag * cycle);
      f2 += f * f;
      fn++;
    }
    final List<RunResult.StabilityPoint> stab = new ArrayList<>();
    for (int m : Stability.decadeFactors(settled.length, cycle)) {
      stab.add(new RunResult.StabilityPoint(m * cycle, Stability.adev(settled, cycle, m), Stability.tdev(settled, cycle, m),
          sc.oscillator().expectedAdev(m * cycle)));
    }
    final Map<String, Double> modes = new LinkedHashMap<>();
    for (int m = 0; m < ServoMode.COUNT; m++) {
      modes.put(ServoMode.name(m), hk.timeInModeS(m));
    }
    final Map<String, Integer> faults = new LinkedHashMap<>();
    for (int c = Status.FIRST_FAULT; c < Status.COUNT; c++) {
      if (hk.orbitCounts(c) > 0) {
        faults.put("orbit." + Status.name(c), hk.orbitCounts(c));
      }
      if (hk.measurementCounts(c) > 0) {
        faults.put("measurement." + Status.name(c), hk.measurementCounts(c));
      }
    }
    final double span = (errorS.length - 1) * (double) cycle;
    return new RunResult(sc.name(), seed, sc.modelLevel(), sc.oscillator().name(), span, settle, max * 1e9,
        n > 0 ? Math.sqrt(sum2 / n) * 1e9 : Double.NaN, maxAll * 1e9, fn > 0 ? Math.sqrt(f2 / fn) : Double.NaN, stab,
        modes, faults, truth.properTimeOffsetS(span) / span, hk.modelOffsetS() / span, thirdBodies);
  }
}
