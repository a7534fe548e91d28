package org.eigenzeit.onboard.tracker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.KeplerOrbit;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.relativity.ModelLevel;
import org.eigenzeit.onboard.relativity.OrbitSample;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.junit.jupiter.api.Test;

/**
 * Re-acquisition after STALE (docs/algorithms.md section 3 is the oracle): a sample is taken only
 * when the one held before it agrees with it, so zero or subnormal velocities and 50 km jumps are
 * never taken, while two consistent samples after a manoeuvre are. The faults are isolated (a
 * faulty sample between good ones); two consecutive samples with the same fault agree with each
 * other and are the rule's documented limit.
 */
class ReacquisitionTest {
  private static final double GM = CentralBody.EARTH.gmM3PerS2();
  private static final long T0 = 850_000_000L;
  private final OrbitSample s = new OrbitSample();
  private final double[] r = new double[3];
  private final double[] v = new double[3];

  private static ProperTimeTracker staleTracker(KeplerOrbit orbit) {
    final ProperTimeTracker t = new ProperTimeTracker(ModelConfig.builder().level(ModelLevel.J2).tides(false)
        .energyToleranceRel(2e-3).bridgeLimitS(300).build());
    final OrbitSample s = new OrbitSample();
    final double[] r = new double[3];
    final double[] v = new double[3];
    for (int k = 0; k < 10; k++) {
      orbit.state(k, r, v);
      s.set(SplitTime.of(T0 + k, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
      assertEquals(Status.OK, t.step(SplitTime.of(T0 + k, 0), s));
    }
    for (int k = 10; k < 400; k++) {
      assertTrue(Status.isUsable(t.step(SplitTime.of(T0 + k, 0), null)) || t.solutionStatus() == Status.STALE);
    }
    assertEquals(Status.STALE, t.solutionStatus());
    return t;
  }

  @Test
  void faultySamplesAreNeverTakenAfterStale() {
    final KeplerOrbit orbit = new KeplerOrbit(GM, 7.0e6, 0.01, 0.9, 0.1, 0.2, 0.3);
    final SplittableRandom rnd = new SplittableRandom(20_261_208L);
    int taken = 0;
    int faultsOffered = 0;
    for (int run = 0; run < 1000; run++) {
      final ProperTimeTracker t = staleTracker(orbit);
      int previous = 1;
      for (int k = 400; k < 430; k++) {
        orbit.state(k, r, v);
        // isolated faults: two consecutive samples with the same fault agree with each other, which
        // no two-sample rule can tell from a real state (docs/algorithms.md)
        final int kind = previous != 0 || rnd.nextInt(3) == 0 ? 0 : 1 + rnd.nextInt(2);
        previous = kind;
        if (kind == 1) { // zero or subnormal velocity
          final double tiny = rnd.nextBoolean() ? 0.0 : Double.MIN_VALUE;
          v[0] = tiny;
          v[1] = tiny;
          v[2] = tiny;
        } else if (kind == 2) { // a 50 km jump along the orbit
          final double vn = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
          for (int i = 0; i < 3; i++) {
            r[i] += 5.0e4 * v[i] / vn;
          }
        }
        faultsOffered += kind != 0 ? 1 : 0;
        s.set(SplitTime.of(T0 + k, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
        final int st = t.step(SplitTime.of(T0 + k, 0), s);
        if (st == Status.OK || st == Status.LONG_STEP) {
          taken++;
          assertEquals(0, kind, "a faulty sample was taken (kind " + kind + ") in run " + run);
          assertEquals(r[0], t.inertialPositionM(0), 0.0);
          break; // re-acquired: from here on the energy check against this node applies
        }
      }
    }
    System.out.printf("re-acquisition: %d faulty samples offered after STALE, none taken; %d good ones taken%n",
        faultsOffered, taken);
    assertEquals(1000, taken, "every run re-acquired on good samples");
    assertTrue(faultsOffered > 800, "the runs offered faults before re-acquiring: " + faultsOffered);
  }

  @Test
  void twoConsistentSamplesAfterAManoeuvreAreTaken() {
    final KeplerOrbit before = new KeplerOrbit(GM, 7.0e6, 0.001, 0.9, 0.1, 0.2, 0.3);
    final ProperTimeTracker t = staleTracker(before);
    final KeplerOrbit after = new KeplerOrbit(GM, 7.1e6, 0.02, 0.9, 0.1, 0.2, 1.3); // another orbit
    after.state(400, r, v);
    s.set(SplitTime.of(T0 + 400, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.REACQUIRING, t.step(SplitTime.of(T0 + 400, 0), s));
    after.state(410, r, v);
    s.set(SplitTime.of(T0 + 410, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.LONG_STEP, t.step(SplitTime.of(T0 + 410, 0), s), "confirmed 10 s later: taken");
    assertEquals(Status.OK, t.solutionStatus());
    assertEquals(1, t.count(Status.REACQUIRING));
  }

  @Test
  void aCandidateWhoseVelocityDisagreesIsNotTaken() {
    // docs/algorithms.md section 3: confirmation needs both the position within CONFIRM_POSITION_M
    // and the velocity within CONFIRM_VELOCITY_MPS of the held sample propagated to the candidate.
    final KeplerOrbit orbit = new KeplerOrbit(GM, 7.0e6, 0.001, 0.9, 0.1, 0.2, 0.3);
    final ProperTimeTracker t = staleTracker(orbit);
    orbit.state(400, r, v);
    s.set(SplitTime.of(T0 + 400, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.REACQUIRING, t.step(SplitTime.of(T0 + 400, 0), s));
    orbit.state(401, r, v);
    final double vn = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
    final double off = 2 * org.eigenzeit.onboard.tracker.validation.SampleValidator.CONFIRM_VELOCITY_MPS; // twice the limit, position exact
    s.set(SplitTime.of(T0 + 401, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0] + off * v[0] / vn,
        v[1] + off * v[1] / vn, v[2] + off * v[2] / vn, true);
    assertEquals(Status.UNCONFIRMED, t.step(SplitTime.of(T0 + 401, 0), s), "velocity 2 m/s off the held state");
    assertEquals(Status.STALE, t.solutionStatus());
    assertEquals(1, t.count(Status.UNCONFIRMED));
  }

  @Test
  void aStateWithoutAnOrbitIsRefusedAtReacquisition() {
    final KeplerOrbit orbit = new KeplerOrbit(GM, 7.0e6, 0.001, 0.9, 0.1, 0.2, 0.3);
    final ProperTimeTracker t = staleTracker(orbit);
    for (int k = 400; k < 405; k++) {
      orbit.state(k, r, v);
      s.set(SplitTime.of(T0 + k, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], 0.0, 0.0, 0.0, true);
      assertEquals(Status.SPEED_OUT_OF_RANGE, t.step(SplitTime.of(T0 + k, 0), s), "a stuck producer: v = 0");
    }
    orbit.state(500, r, v);
    s.set(SplitTime.of(T0 + 500, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.REACQUIRING, t.step(SplitTime.of(T0 + 500, 0), s));
    orbit.state(1200, r, v);
    s.set(SplitTime.of(T0 + 1200, 0), OrbitSample.FRAME_INERTIAL, r[0], r[1], r[2], v[0], v[1], v[2], true);
    assertEquals(Status.UNCONFIRMED, t.step(SplitTime.of(T0 + 1200, 0), s), "700 s after the held one: too far");
    assertEquals(Status.STALE, t.solutionStatus());
  }
}
