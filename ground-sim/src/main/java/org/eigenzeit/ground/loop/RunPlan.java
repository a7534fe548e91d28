package org.eigenzeit.ground.loop;

import java.util.SplittableRandom;
import org.eigenzeit.ground.truth.EstimateErrors;
import org.eigenzeit.ground.truth.MeasurementPlan;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * Everything the closed loop needs for one run, made by the setup step: the core's configuration
 * and servo table, the truth models, and the run's random source (already past the draws the setup
 * made). The loop reads nothing else.
 *
 * @param coreConfig the onboard model configuration
 * @param applyModel false for the model level "none"
 * @param servoTable the encoded servo table
 * @param t0 start epoch, TT
 * @param cycleS cycle, s
 * @param steps number of cycles after the first (the run has steps + 1 cycles)
 * @param earth true for an Earth orbit (estimates in the ITRS), false for the Moon (inertial)
 * @param ut1MinusTtS UT1 - TT for the Earth-fixed estimate, s
 * @param truth true orbit and proper time
 * @param oscillatorPhaseS free oscillator phase at 1 s spacing, s (at least steps * cycleS + 1 values)
 * @param actuatorQuantum steering hardware quantum
 * @param actuatorDelayCycles steering delay, cycles
 * @param errors orbit-estimate errors
 * @param measurements time-offset measurement plan
 * @param initialTimeErrorS initial onboard time error, s
 * @param outputEvery time-series decimation, cycles
 * @param random the run's random source (the loop draws from it)
 * @param lunar the lunar time table of a Moon-centred run, null for the Earth
 */
public record RunPlan(ModelConfig coreConfig, boolean applyModel, byte[] servoTable, SplitTime t0, int cycleS,
    int steps, boolean earth, double ut1MinusTtS, TruthOrbit truth, double[] oscillatorPhaseS, double actuatorQuantum,
    int actuatorDelayCycles, EstimateErrors errors, MeasurementPlan measurements, double initialTimeErrorS,
    int outputEvery, SplittableRandom random, LunarUplink lunar) {

  /** Defensive copies of the arrays and the epoch. */
  public RunPlan {
    servoTable = servoTable.clone();
    oscillatorPhaseS = oscillatorPhaseS.clone();
    final SplitTime t = new SplitTime();
    t.setTo(t0);
    t0 = t;
  }

  @Override
  public byte[] servoTable() {
    return servoTable.clone();
  }

  @Override
  public double[] oscillatorPhaseS() {
    return oscillatorPhaseS.clone();
  }

  @Override
  public SplitTime t0() {
    final SplitTime t = new SplitTime();
    t.setTo(t0);
    return t;
  }
}
