package org.eigenzeit.ground.loop;

import org.eigenzeit.ground.timescale.LunarRecord;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What the loop recorded: the time error of every cycle, the decimated time series and the core's
 * counters at the end. The summary is made from it separately.
 *
 * @param errorS corrected time minus true scale at each cycle, s
 * @param series the decimated time series
 * @param firstTrackS first cycle time in TRACK, s (-1: never)
 * @param timeInModeS seconds in each mode, by mode name
 * @param faults nonzero fault counters
 * @param trueOffsetEndS true proper-time offset at the last cycle, s
 * @param modelOffsetEndS the onboard model's offset at the last cycle, s
 * @param cycleS cycle, s
 * @param lunar the lunar time figures of a Moon-centred run, null for the Earth
 */
public record RunRecord(double[] errorS, TimeSeries series, double firstTrackS, Map<String, Double> timeInModeS,
    Map<String, Integer> faults, double trueOffsetEndS, double modelOffsetEndS, int cycleS, LunarRecord lunar) {

  /** Defensive copies. */
  public RunRecord {
    errorS = errorS.clone();
    timeInModeS = Collections.unmodifiableMap(new LinkedHashMap<>(timeInModeS));
    faults = Collections.unmodifiableMap(new LinkedHashMap<>(faults));
  }

  @Override
  public double[] errorS() {
    return errorS.clone();
  }

  /** @return the span, s (cycles after the first times the cycle) */
  public double spanS() {
    return (errorS.length - 1) * (double) cycleS;
  }
}
