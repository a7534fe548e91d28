package org.eigenzeit.ground.loop;

import org.eigenzeit.ground.timescale.LunarRecord;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.SplittableRandom;
import org.eigenzeit.ground.instant.Instants;
import org.eigenzeit.ground.truth.Actuator;
import org.eigenzeit.ground.truth.EstimateErrors;
import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.steering.TimeOffsetMeasurement;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The closed loop: runs the cycles of a {@link RunPlan}, nothing else.
 *
 * <p>Per cycle: the raw counter {@code C = TT + Delta tau + x_osc + S + x0} from the truth (true
 * proper-time offset, free oscillator phase, the actuator's steering phase, the initial error);
 * the orbit estimate (the truth state rotated to the ITRS as a GNSS receiver gives it, inertial for
 * the Moon, with the plan's errors); when due, a time-offset measurement (corrected time minus the
 * true scale, with noise and outliers); then the onboard core's cycle, the corrected time's error,
 * and the actuator's step with the core's new command. Every random draw comes from the plan's
 * random source in a fixed order, so a run is a pure function of its plan.
 */
public final class ClosedLoop {
  private ClosedLoop() {}

  /**
   * Runs the cycles.
   *
   * @param plan the run's plan
   * @return what the loop recorded
   */
  public static RunRecord run(RunPlan plan) {
    final OnboardUnit core = new OnboardUnit(plan.coreConfig(), plan.applyModel(), plan.servoTable(), plan.cycleS());
    final LunarUplink lunar = plan.lunar();
    final byte[] lunarImage = lunar == null ? null : lunar.image();
    final String uplinkStatus = lunarImage == null ? "none" : Status.name(core.uplinkLunarTable(lunarImage));
    final LunarTally tally = lunar == null ? null : new LunarTally();
    final SplittableRandom rnd = plan.random();
    final TruthOrbit truth = plan.truth();
    final int cycle = plan.cycleS();
    final int steps = plan.steps();
    final SplitTime t0 = plan.t0();
    final double[] xOsc = plan.oscillatorPhaseS();
    final Actuator actuator = new Actuator(plan.actuatorQuantum(), plan.actuatorDelayCycles());
    final EarthOrientation eo = new EarthOrientation(MathMode.FAST, CentralBody.EARTH.rotationRateRadPerS());
    final EstimateErrors err = plan.errors();
    final MeasurementPlan mplan = plan.measurements();
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
    final int every = plan.outputEvery();
    final TimeSeries series = new TimeSeries(steps / every + 1);
    double firstTrack = -1;
    double dtau = 0;
    for (int k = 0; k <= steps; k++) {
      final double t = (double) k * cycle;
      Instants.shifted(tt, t0, t);
      dtau = truth.properTimeOffsetS(t);
      Instants.shifted(raw, tt, dtau + xOsc[k * cycle] + actuator.phaseS() + plan.initialTimeErrorS());
      OrbitSample orbitIn = null;
      if (!inGap(err, t)) {
        truth.state(t, r, v);
        orbitIn = sample;
        if (plan.earth()) {
          eo.update(tt, plan.ut1MinusTtS());
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
      if (mplan.due(t, cycle)) {
        core.correctedTime(raw, corrected);
        double z = corrected.secondsSince(tt) + mplan.sigmaS() * gaussian(rnd);
        if (mplan.outlierProbability() > 0 && rnd.nextDouble() < mplan.outlierProbability()) {
          z += (rnd.nextBoolean() ? 1 : -1) * mplan.outlierS();
        }
        meas.set(corrected, mplan.source(), z, true);
        measIn = meas;
      }
      core.cycle(raw, orbitIn, measIn);
      core.correctedTime(raw, corrected);
      errorS[k] = corrected.secondsSince(tt);
      if (firstTrack < 0 && core.tracking()) {
        firstTrack = t;
      }
      actuator.step(core.command(), cycle);
      if (tally != null && k % every == 0) {
        tally.row(core, lunar, raw, tt, truth, t, r, v);
      }
      if (k % every == 0 && k / every < series.size()) {
        series.row(k / every, t, errorS[k] * 1e9, core.mode(), core.command(), core.phaseS() * 1e9, dtau * 1e6,
            core.modelOffsetS() * 1e6, core.orbitSolutionStatus());
      }
    }
    final double[] inMode = core.timeInModeS();
    final Map<String, Double> modes = new LinkedHashMap<>();
    for (int m = 0; m < inMode.length; m++) {
      modes.put(OnboardUnit.modeName(m), inMode[m]);
    }
    final LunarRecord lunarRecord = tally == null ? null : tally.record(core, lunar, uplinkStatus, dtau);
    return new RunRecord(errorS, series, firstTrack, modes, core.faults(), dtau, core.modelOffsetS(), cycle,
        lunarRecord);
  }

  /** The lunar figures over the output rows (ground code: allocates). */
  private static final class LunarTally {
    private final SplitTime coreTt = new SplitTime();
    private final SplitTime trueTt = new SplitTime();
    private int valid;
    private int held;
    private double maxTable = Double.NaN;
    private double maxTt = Double.NaN;
    private double trueAtStart = Double.NaN;
    private double trueAtEnd = Double.NaN;

    void row(OnboardUnit core, LunarUplink lunar, SplitTime raw, SplitTime trueTl, TruthOrbit truth, double t,
        double[] r, double[] v) {
      truth.state(t, r, v);
      // the true TT of the event: TT = TL - (TL - TT)(TT), two fixed-point passes (rate 6.5e-10)
      trueTt.setTo(trueTl);
      double f = 0;
      for (int pass = 0; pass < 3; pass++) {
        f = lunar.reference().tlMinusTtAtClockS(trueTt, r);
        trueTt.setTo(trueTl);
        Instants.shift(trueTt, -f);
      }
      if (Double.isNaN(trueAtStart)) {
        trueAtStart = f;
      }
      trueAtEnd = f;
      final int st = core.correctedTimeTt(raw, coreTt);
      if (st == Status.OK && core.housekeeping().lunarValid()) {
        valid++;
        maxTable = Double.isNaN(maxTable) ? 0 : maxTable;
        maxTable = Math.max(maxTable, Math.abs(core.housekeeping().tlMinusTtS() - f));
        maxTt = Double.isNaN(maxTt) ? 0 : maxTt;
        maxTt = Math.max(maxTt, Math.abs(coreTt.secondsSince(trueTt)));
      } else {
        held++;
      }
    }

    LunarRecord record(OnboardUnit core, LunarUplink lunar, String uplinkStatus, double trueOffsetEndS) {
      final var hk = core.housekeeping();
      return new LunarRecord(uplinkStatus, lunar.accuracyS(), lunar.startTtS(), lunar.endTtS(), valid, held, maxTable,
          maxTt, hk.tlMinusTtS(), trueOffsetEndS + (trueAtEnd - trueAtStart), Status.name(hk.lunarStatus()),
          hk.lunarHeldCycles(), hk.lunarOutOfSpan(), hk.lunarNotReady());
    }
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

  /** Box-Muller (Box and Muller 1958), one value per call. */
  static double gaussian(SplittableRandom rnd) {
    double u1 = rnd.nextDouble();
    while (u1 <= 0) {
      u1 = rnd.nextDouble();
    }
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * rnd.nextDouble());
  }
}
