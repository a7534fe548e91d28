package org.eigenzeit.ground.loop;

import org.eigenzeit.ground.timescale.TimeScaleConverter;

/**
 * The lunar time table of a Moon-centred run: the framed uplink image the core receives (TableId
 * LUNAR_TIME; null when the scenario uplinks none), what the fit stated, and the ground's own
 * relation the loop checks the core's TL - TT against.
 *
 * @param image the framed image (possibly damaged by the scenario), or null
 * @param accuracyS the fit accuracy the table states, s
 * @param degree Chebyshev degree
 * @param segments segment count
 * @param startTtS span start, TT whole seconds since J2000.0
 * @param endTtS span end
 * @param damage the scenario's damage ("none", "crc", "absent")
 * @param reference the ground's relations along DE405 (TimeScaleConverter#tlMinusTtAtClockS)
 */
public record LunarUplink(byte[] image, double accuracyS, int degree, int segments, long startTtS, long endTtS,
    String damage, TimeScaleConverter reference) {
  /** Defensive copy. */
  public LunarUplink {
    image = image == null ? null : image.clone();
  }

  @Override
  public byte[] image() {
    return image == null ? null : image.clone();
  }
}
