package org.eigenzeit.bench.peer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eigenzeit.onboard.status.Status;
import java.util.Locale;
import java.util.Map;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.reference.ReferenceConfig;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.frames.EarthOrientation;
import org.eigenzeit.onboard.math.MathMode;
import org.eigenzeit.onboard.time.SplitTime;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.orekit.frames.FramesFactory;
import org.orekit.time.AbsoluteDate;

/**
 * The side-by-side benchmark does the same work on both sides: the reference and Orekit 13
 * (independent general-purpose library; HolmesFeatherstone gravity, its own third-body and
 * Newtonian terms, fed our EGM96, DE405 and Earth rotation) agree after one day, for every case
 * of PeerRun, and each side's own integration error (against itself at 1e-14) is of the same size.
 * Pins the figures of docs/performance.md, "The reference against a peer".
 */
class PeerAgreementTest {
  /** Published position differences after one day, m (docs/performance.md): ours vs peer, own errors. */
  private static final Map<String, double[]> PUBLISHED = Map.of(
      "LEO 20", new double[] {8.4e-6, 2.0e-4, 1.9e-4},
      "LEO 36", new double[] {3.0e-6, 4.8e-3, 4.9e-3},
      "MEO 20", new double[] {2.3e-7, 4.3e-7, 6.5e-7},
      "MEO 36", new double[] {2.2e-7, 4.3e-7, 6.6e-7});

  @Test
  void sharedEarthFrameRotatesLikeOurEarthOrientation() {
    final SplitTime t0 = PeerRun.T0;
    final AbsoluteDate date0 = new AbsoluteDate(AbsoluteDate.J2000_EPOCH, (double) t0.wholeSeconds());
    final SharedEarthFrame provider = new SharedEarthFrame(t0, date0, -69.2, CentralBody.EARTH.rotationRateRadPerS());
    final double[] r = {-4.1e6, 3.3e6, 4.4e6};
    final double dt = 5432.1;
    final Vector3D viaOrekit = FramesFactory.getGCRF().getStaticTransformTo(provider.frame(), date0.shiftedBy(dt))
        .transformPosition(new Vector3D(r[0], r[1], r[2]));
    final EarthOrientation eo = new EarthOrientation(MathMode.STRICT, CentralBody.EARTH.rotationRateRadPerS());
    final SplitTime t = SplitTime.of(t0.wholeSeconds(), t0.fractionS());
    assertEquals(Status.OK, t.addSeconds(dt));
    eo.update(t, -69.2);
    final double[] ours = new double[3];
    eo.positionToItrs(r, ours);
    assertEquals(0.0, viaOrekit.distance(new Vector3D(ours[0], ours[1], ours[2])), 1e-8, "same rotation, m");
  }

  @Test
  void bothSidesAgreeAfterOneDay() {
    for (PeerRun.Case c : PeerRun.CASES) {
      final ReferenceConfig cfg = ReferenceConfig.earth(c.degree());
      final ReferenceConfig tight = cfg.withIntegrator(ReferenceConfig.IntegratorKind.DORMAND_PRINCE_853, 1e-14);
      final OrbitSpec o = c.spec();
      final long[] evalsOurs = new long[1];
      final long[] evalsPeer = new long[1];
      final double[] a = PeerRun.ours(cfg, o, evalsOurs);
      final double[] b = PeerRun.peer(cfg, o, evalsPeer);
      final double[] measured = {PeerRun.distance(a, b), PeerRun.distance(a, PeerRun.ours(tight, o, new long[1])),
          PeerRun.distance(b, PeerRun.peer(tight, o, new long[1]))};
      final String key = c.orbit().toLowerCase(Locale.ROOT) + "_" + c.degree();
      System.out.printf(Locale.ROOT, "%s %d: ours vs Orekit %.2e m, own error ours %.1e m, Orekit %.1e m, "
          + "evaluations %d / %d%n", c.orbit(), c.degree(), measured[0], measured[1], measured[2], evalsOurs[0],
          evalsPeer[0]);
      System.out.printf(Locale.ROOT, "evidence: peer.%s.position_difference_m = %.3e%n", key, measured[0]);
      System.out.printf(Locale.ROOT, "evidence: peer.%s.own_error_ours_m = %.3e%n", key, measured[1]);
      System.out.printf(Locale.ROOT, "evidence: peer.%s.own_error_orekit_m = %.3e%n", key, measured[2]);
      assertEquals(evalsOurs[0], evalsPeer[0], "the same step sequence on both sides");
      final double[] published = PUBLISHED.get(c.orbit() + " " + c.degree());
      final String[] what = {"ours vs Orekit", "own error ours", "own error Orekit"};
      for (int k = 0; k < 3; k++) {
        assertTrue(measured[k] <= 10 * published[k], c + " " + what[k] + ": " + measured[k] + " m");
      }
    }
  }
}
