package org.eigenzeit.onboard.corrector;

import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.restart.StateWriter;

/**
 * The canonical bytes of a corrector's configuration, for the identity of its restart buffer:
 * every value that changes what the state means (construction time; allocates).
 */
final class ConfigIdentity {
  private ConfigIdentity() {}

  static byte[] bytes(ModelConfig c, boolean applyModel, boolean counterIsSteered, double maxRawStepS) {
    final byte[] b = new byte[256];
    final StateWriter w = new StateWriter();
    w.reset(b, 0, b.length);
    final CentralBody body = c.body();
    w.putInt(body.centre());
    for (double v : new double[] {body.gmM3PerS2(), body.referenceRadiusM(), body.j2(), body.rotationRateRadPerS(),
        body.scaleRateL(), body.minRadiusM(), body.maxRadiusM(), body.maxSpeedMPerS()}) {
      w.putDouble(v);
    }
    w.putInt(c.level() == ModelLevel.POINT_MASS ? 0 : c.level() == ModelLevel.J2 ? 1 : 2);
    w.putInt(c.degree());
    w.putBoolean(c.tides());
    w.putBoolean(c.c4());
    w.putBoolean(c.math().isStrict());
    for (double v : new double[] {c.ut1MinusTtS(), c.nominalStepS(), c.bridgeStepS(), c.bridgeLimitS(),
        c.energyToleranceRel(), c.energyDriftM2PerS3(), c.maxSampleAgeS(), c.futureToleranceS(),
        c.bridgeRateErrorPerS(), maxRawStepS}) {
      w.putDouble(v);
    }
    w.putBoolean(applyModel);
    w.putBoolean(counterIsSteered);
    return java.util.Arrays.copyOf(b, w.position());
  }
}
