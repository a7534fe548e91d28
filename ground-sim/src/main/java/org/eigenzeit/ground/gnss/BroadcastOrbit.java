package org.eigenzeit.ground.gnss;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The broadcast orbits of the accepted records: at each instant the accepted record of the
 * satellite whose reference epoch is closest, if the instant lies within its fit interval
 * (Keplerian records: toe +- half the fit interval, RINEX 2.11 hours with 0 taken as IS-GPS-200's
 * 4 h; GLONASS: t_b +- 15 min); Keplerian states by the IS-GPS-200 user algorithm, GLONASS
 * states by {@link GlonassPropagator}. Immutable.
 */
public final class BroadcastOrbit implements OrbitSource {
  /** Half the validity of a GLONASS record, s. */
  public static final double GLONASS_HALF_VALIDITY_S = 900.0;
  /** Fit interval taken when a record says 0 (not known), h. */
  public static final double DEFAULT_FIT_H = 4.0;

  private final String description;
  private final Map<String, List<BroadcastCheck.Verdict>> accepted = new LinkedHashMap<>();

  /**
   * Builds the orbits from verdicts.
   *
   * @param description what the records came from
   * @param verdicts all verdicts (only the accepted ones are used)
   */
  public BroadcastOrbit(String description, List<BroadcastCheck.Verdict> verdicts) {
    this.description = description;
    for (BroadcastCheck.Verdict v : verdicts) {
      if (v.outcome() == BroadcastCheck.Outcome.ACCEPTED) {
        accepted.computeIfAbsent(v.id(), k -> new ArrayList<>()).add(v);
      }
    }
  }

  @Override
  public String describe() {
    return description;
  }

  @Override
  public List<String> satellites() {
    return List.copyOf(accepted.keySet());
  }

  /**
   * Half the fit interval of a record, s.
   *
   * @param v the verdict
   * @return the half interval
   */
  public static double halfFitS(BroadcastCheck.Verdict v) {
    if (v.glonass() != null) {
      return GLONASS_HALF_VALIDITY_S;
    }
    final double h = v.kepler().get(KeplerRecord.FIT);
    return (h > 0 ? h : DEFAULT_FIT_H) * 1800.0;
  }

  /**
   * The accepted record serving an instant.
   *
   * @param id satellite
   * @param gpsS GPS seconds
   * @return the record, or null
   */
  public BroadcastCheck.Verdict select(String id, double gpsS) {
    BroadcastCheck.Verdict best = null;
    for (BroadcastCheck.Verdict v : accepted.getOrDefault(id, List.of())) {
      final double d = Math.abs(gpsS - v.referenceGpsS());
      if (d <= halfFitS(v) && (best == null || d <= Math.abs(gpsS - best.referenceGpsS()))) {
        best = v;
      }
    }
    return best;
  }

  /**
   * Why no accepted record serves an instant.
   *
   * @param id satellite
   * @param gpsS GPS seconds
   * @return the reason
   */
  public String whyNoRecord(String id, double gpsS) {
    final List<BroadcastCheck.Verdict> list = accepted.getOrDefault(id, List.of());
    if (list.isEmpty()) {
      return "no accepted broadcast record";
    }
    BroadcastCheck.Verdict near = list.get(0);
    for (BroadcastCheck.Verdict v : list) {
      if (Math.abs(gpsS - v.referenceGpsS()) < Math.abs(gpsS - near.referenceGpsS())) {
        near = v;
      }
    }
    return String.format(Locale.ROOT, "no accepted record within its fit interval (nearest %s, %.2f h from its "
        + "reference epoch, fit interval +-%.2f h)", near.where(), Math.abs(gpsS - near.referenceGpsS()) / 3600,
        halfFitS(near) / 3600);
  }

  @Override
  public String state(String id, double gpsS, double[] rE, double[] vE) {
    final BroadcastCheck.Verdict v = select(id, gpsS);
    if (v == null) {
      return whyNoRecord(id, gpsS);
    }
    if (v.kepler() != null) {
      v.kepler().state(gpsS, rE, vE);
    } else {
      GlonassPropagator.propagate(v.glonass(), gpsS, GlonassPropagator.STEP_S, rE, vE);
    }
    return null;
  }
}
