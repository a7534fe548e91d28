package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.math.MathMode;

/**
 * Immutable configuration of the rate model and the offset tracker. Built once, before flight
 * operations, with {@link #builder()}; {@link ModelConfigBuilder#build()} throws on a bad value (a
 * construction-time programmer or configuration error, never on the hot path).
 *
 * <p>Defaults: Earth, HARMONICS to degree 8 of EGM96, tides on, c^-4 off, FAST math,
 * UT1 - TT = -69.2 s, nominal step 1 s, bridging with a 10 s step for up to 1800 s.
 */
public final class ModelConfig {
  private final CentralBody body;
  private final ModelLevel level;
  private final int degree;
  private final GravityField field;
  private final boolean tides;
  private final boolean c4;
  private final MathMode math;
  private final double ut1MinusTtS;
  private final double nominalStepS;
  private final double bridgeStepS;
  private final double bridgeLimitS;
  private final double energyToleranceRel;
  private final double energyDriftM2PerS3;
  private final double maxSampleAgeS;
  private final double futureToleranceS;
  private final double bridgeRateErrorPerS;

  ModelConfig(ModelConfigBuilder b) {
    this.body = b.body;
    this.level = b.level;
    this.degree = b.degree;
    this.field = b.field;
    this.tides = b.tides;
    this.c4 = b.c4;
    this.math = b.math;
    this.ut1MinusTtS = b.ut1MinusTtS;
    this.nominalStepS = b.nominalStepS;
    this.bridgeStepS = b.bridgeStepS;
    this.bridgeLimitS = b.bridgeLimitS;
    this.energyToleranceRel = b.energyToleranceRel;
    this.energyDriftM2PerS3 = b.energyDriftM2PerS3;
    this.maxSampleAgeS = b.maxSampleAgeS;
    this.futureToleranceS = b.futureToleranceS;
    this.bridgeRateErrorPerS = b.bridgeRateErrorPerS;
  }

  /**
   * Returns a builder with the defaults.
   *
   * @return a builder with the defaults
   */
  public static ModelConfigBuilder builder() {
    return new ModelConfigBuilder();
  }

  /**
   * Returns a builder holding this configuration's values.
   *
   * @return a builder holding this configuration's values
   */
  public ModelConfigBuilder toBuilder() {
    final ModelConfigBuilder b = new ModelConfigBuilder();
    b.body = body;
    b.level = level;
    b.degree = degree;
    b.field = field;
    b.tides = tides;
    b.c4 = c4;
    b.math = math;
    b.ut1MinusTtS = ut1MinusTtS;
    b.nominalStepS = nominalStepS;
    b.bridgeStepS = bridgeStepS;
    b.bridgeLimitS = bridgeLimitS;
    b.energyToleranceRel = energyToleranceRel;
    b.energyDriftM2PerS3 = energyDriftM2PerS3;
    b.maxSampleAgeS = maxSampleAgeS;
    b.futureToleranceS = futureToleranceS;
    b.bridgeRateErrorPerS = bridgeRateErrorPerS;
    return b;
  }

  /**
   * Returns the central body.
   *
   * @return the central body
   */
  public CentralBody body() {
    return body;
  }

  /**
   * Returns the gravity model level.
   *
   * @return the gravity model level
   */
  public ModelLevel level() {
    return level;
  }

  /**
   * Returns the harmonic degree (used at level HARMONICS).
   *
   * @return the harmonic degree (used at level HARMONICS)
   */
  public int degree() {
    return degree;
  }

  /**
   * Returns whether the lunisolar (or Earth-Sun) tidal term is on.
   *
   * @return whether the lunisolar (or Earth-Sun) tidal term is on
   */
  public boolean tides() {
    return tides;
  }

  /**
   * Returns whether the c^-4 terms are on.
   *
   * @return whether the c^-4 terms are on
   */
  public boolean c4() {
    return c4;
  }

  /**
   * Returns the math mode.
   *
   * @return the math mode
   */
  public MathMode math() {
    return math;
  }

  /**
   * Returns the bridging limit, s.
   *
   * @return the bridging limit, s
   */
  public double bridgeLimitS() {
    return bridgeLimitS;
  }


  /**
   * Returns the coefficient table of level HARMONICS (null at other levels).
   *
   * @return the immutable coefficient set
   */
  public GravityField field() {
    return field;
  }

  /**
   * Returns UT1 - TT, s.
   *
   * @return UT1 - TT, s
   */
  public double ut1MinusTtS() {
    return ut1MinusTtS;
  }

  /**
   * Returns the nominal integration step, s (longer steps are reported as LONG_STEP).
   *
   * @return the nominal step, s
   */
  public double nominalStepS() {
    return nominalStepS;
  }

  /**
   * Returns the bridging integrator step, s.
   *
   * @return the bridging step, s
   */
  public double bridgeStepS() {
    return bridgeStepS;
  }

  /**
   * Returns the relative energy tolerance of the vis-viva check.
   *
   * @return the relative tolerance
   */
  public double energyToleranceRel() {
    return energyToleranceRel;
  }

  /**
   * Returns the energy drift allowance per second of gap, m^2/s^3.
   *
   * @return the drift allowance
   */
  public double energyDriftM2PerS3() {
    return energyDriftM2PerS3;
  }

  /**
   * Returns the oldest sample accepted, s before the cycle time.
   *
   * @return the maximum age, s
   */
  public double maxSampleAgeS() {
    return maxSampleAgeS;
  }

  /**
   * Returns how far a sample may lie after the cycle time, s.
   *
   * @return the future tolerance, s
   */
  public double futureToleranceS() {
    return futureToleranceS;
  }

  /**
   * Returns the growth of the fractional-frequency error bound per second of bridging, 1/s.
   *
   * @return the growth, 1/s
   */
  public double bridgeRateErrorPerS() {
    return bridgeRateErrorPerS;
  }
}
