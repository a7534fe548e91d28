package org.eigenzeit.onboard.relativity;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.gravity.GravityField;
import org.eigenzeit.onboard.math.MathMode;

/**
 * Mutable builder of a {@link ModelConfig}, from {@link ModelConfig#builder()}; {@link #build()}
 * checks every value and throws on a bad one (a construction-time configuration error). Not
 * thread-safe.
 */
public final class ModelConfigBuilder {
  CentralBody body = CentralBody.EARTH;
  ModelLevel level = ModelLevel.HARMONICS;
  int degree = 8;
  GravityField field;
  boolean tides = true;
  boolean c4;
  MathMode math = MathMode.FAST;
  double ut1MinusTtS = -69.2;
  double nominalStepS = 1.0;
  double bridgeStepS = 10.0;
  double bridgeLimitS = 1800.0;
  double energyToleranceRel = 1.0e-4;
  double energyDriftM2PerS3 = 1.0;
  double maxSampleAgeS = 30.0;
  double futureToleranceS = 1.0;
  double bridgeRateErrorPerS = 5.0e-18;

  ModelConfigBuilder() {}

  /**
   * Sets the central body.
   *
   * @param v central body
   * @return this
   */
  public ModelConfigBuilder body(CentralBody v) {
    body = v;
    return this;
  }

  /**
   * Sets the model level.
   *
   * @param v model level
   * @return this
   */
  public ModelConfigBuilder level(ModelLevel v) {
    level = v;
    return this;
  }

  /**
   * Sets the harmonic degree, 2 to the field's capacity (level HARMONICS).
   *
   * @param v harmonic degree, 2 to the field's capacity (level HARMONICS)
   * @return this
   */
  public ModelConfigBuilder degree(int v) {
    degree = v;
    return this;
  }

  /**
   * Sets the coefficient table (default: EGM96 to the set degree, for the Earth).
   *
   * @param v coefficient table (default: EGM96 to the set degree, for the Earth)
   * @return this
   */
  public ModelConfigBuilder field(GravityField v) {
    field = v;
    return this;
  }

  /**
   * Sets the tides on or off.
   *
   * @param v tides on or off
   * @return this
   */
  public ModelConfigBuilder tides(boolean v) {
    tides = v;
    return this;
  }

  /**
   * Sets the c^-4 terms on or off.
   *
   * @param v c^-4 terms on or off
   * @return this
   */
  public ModelConfigBuilder c4(boolean v) {
    c4 = v;
    return this;
  }

  /**
   * Sets the math mode.
   *
   * @param v math mode
   * @return this
   */
  public ModelConfigBuilder math(MathMode v) {
    math = v;
    return this;
  }

  /**
   * Sets the UT1 - TT, s (|v| below 1000).
   *
   * @param v UT1 - TT, s (|v| below 1000)
   * @return this
   */
  public ModelConfigBuilder ut1MinusTtS(double v) {
    ut1MinusTtS = v;
    return this;
  }

  /**
   * Sets the nominal integration step, s; longer steps are reported as LONG_STEP.
   *
   * @param v nominal integration step, s; longer steps are reported as LONG_STEP
   * @return this
   */
  public ModelConfigBuilder nominalStepS(double v) {
    nominalStepS = v;
    return this;
  }

  /**
   * Sets the bridging integrator step, s (0.1 to 60).
   *
   * @param v bridging integrator step, s (0.1 to 60)
   * @return this
   */
  public ModelConfigBuilder bridgeStepS(double v) {
    bridgeStepS = v;
    return this;
  }

  /**
   * Sets the longest bridging span before refusing, s.
   *
   * @param v longest bridging span before refusing, s
   * @return this
   */
  public ModelConfigBuilder bridgeLimitS(double v) {
    bridgeLimitS = v;
    return this;
  }

  /**
   * Sets the relative energy tolerance of the vis-viva check.
   *
   * @param v relative energy tolerance of the vis-viva check
   * @return this
   */
  public ModelConfigBuilder energyToleranceRel(double v) {
    energyToleranceRel = v;
    return this;
  }

  /**
   * Sets the energy drift allowance per second of gap, m^2/s^3.
   *
   * @param v energy drift allowance per second of gap, m^2/s^3
   * @return this
   */
  public ModelConfigBuilder energyDriftM2PerS3(double v) {
    energyDriftM2PerS3 = v;
    return this;
  }

  /**
   * Sets the oldest sample accepted, s before the cycle time.
   *
   * @param v oldest sample accepted, s before the cycle time
   * @return this
   */
  public ModelConfigBuilder maxSampleAgeS(double v) {
    maxSampleAgeS = v;
    return this;
  }

  /**
   * Sets the how far a sample may lie after the cycle time, s.
   *
   * @param v how far a sample may lie after the cycle time, s
   * @return this
   */
  public ModelConfigBuilder futureToleranceS(double v) {
    futureToleranceS = v;
    return this;
  }

  /**
   * Sets the growth of the fractional-frequency error bound per second of bridging, 1/s.
   *
   * @param v growth of the fractional-frequency error bound per second of bridging, 1/s
   * @return this
   */
  public ModelConfigBuilder bridgeRateErrorPerS(double v) {
    bridgeRateErrorPerS = v;
    return this;
  }

  /**
   * Checks the values and builds the configuration. Loads the default EGM96 table when the level
   * is HARMONICS and no field was given (construction-time allocation).
   *
   * @return the configuration
   * @throws IllegalArgumentException for a value out of range
   */
  public ModelConfig build() {
    check(body != null && level != null && math != null, "body, level and math are required");
    check(Math.abs(ut1MinusTtS) < 1000.0, "UT1 - TT out of range");
    check(nominalStepS > 0 && nominalStepS <= 3600.0, "nominal step out of range");
    check(bridgeStepS >= 0.1 && bridgeStepS <= 60.0, "bridge step must be 0.1..60 s");
    check(bridgeLimitS >= 0 && bridgeLimitS / bridgeStepS <= OrbitBridge.MAX_STEPS_PER_CALL * 16.0,
        "bridge limit too long for the bridge step");
    check(energyToleranceRel > 0 && energyToleranceRel < 1, "energy tolerance out of range");
    check(energyDriftM2PerS3 >= 0 && Double.isFinite(energyDriftM2PerS3), "energy drift out of range");
    check(maxSampleAgeS > 0 && maxSampleAgeS < 1e6, "sample age out of range");
    check(futureToleranceS >= 0 && futureToleranceS < 1e6, "future tolerance out of range");
    check(bridgeRateErrorPerS >= 0 && bridgeRateErrorPerS < 1e-9, "bridge error growth out of range");
    if (level == ModelLevel.HARMONICS) {
      check(body.centre() == CentralBody.CENTRE_EARTH,
          "level HARMONICS needs an Earth-fixed frame: use J2 for the Moon");
      if (field == null) {
        check(degree >= 2 && degree <= 36, "degree must be 2..36 for the shipped EGM96");
        field = GravityField.egm96(degree);
      }
      check(degree >= 2 && degree <= field.degree(), "degree out of the field's range");
    }
    return new ModelConfig(this);
  }

  private static void check(boolean ok, String message) {
    if (!ok) {
      throw new IllegalArgumentException(message);
    }
  }
}
