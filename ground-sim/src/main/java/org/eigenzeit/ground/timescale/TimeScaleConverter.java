package org.eigenzeit.ground.timescale;

import org.eigenzeit.ground.instant.Instants;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.EnumMap;
import java.util.Map;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.ground.uplink.LeapSecondsList;
import org.eigenzeit.onboard.time.LeapSecondTable;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;

/**
 * Converts the labels of one event between every {@link TimeScale}.
 *
 * <p>The event lies at the geocentre or the selenocentre ({@link Centre}); its coordinates in
 * the local scales follow from the 4-D transformations of {@link TimeScaleRelations}, so an event
 * at the Moon's centre has TT and TDB that differ from the geocentric ones by
 * v_E . (x_M - x_E)/c^2 (up to about 130 us). Chains: UTC - TAI - TT - TCG (exact), TCG - TCB
 * (numerical), TCB - TDB (exact), TCB - TCL (numerical), TCL - TL (exact). The numerical
 * relations take TDB as argument; going from a local scale to TCB, the argument is refined three
 * times (each pass shrinks its error by the rate, about 1.5e-8, so the third leaves below
 * 1e-20 s). Outside the ephemeris span only the atomic and geocentric scales are given.
 *
 * <p>Thread-safe (immutable; the leap-second table is only read).
 */
public final class TimeScaleConverter {
  private static final int PASSES = 3;

  private final TimeScaleRelations relations;
  private final LeapSecondTable leaps;

  /**
   * A converted event.
   *
   * @param at where the event lies
   * @param labels each scale's labels (scales needing the ephemeris are absent outside its span)
   * @param utcHeldInLeapSecond whether UTC is inside an inserted leap second (its labels are
   *     then held at 23:59:59)
   * @param utcStatus the leap-second table's status for this instant (a core status name)
   */
  public record Converted(Centre at, Map<TimeScale, SplitTime> labels, boolean utcHeldInLeapSecond, String utcStatus) {
    /** Defensive copy. */
    public Converted {
      labels = Map.copyOf(labels);
    }
  }

  /**
   * Creates a converter.
   *
   * @param relations the numerical relations, or null for the atomic and geocentric scales only
   * @param leaps an active leap-second table
   */
  public TimeScaleConverter(TimeScaleRelations relations, LeapSecondTable leaps) {
    this.relations = relations;
    this.leaps = leaps;
  }

  /**
   * The converter on the shipped DE405 and leap-second table.
   *
   * @param lunar the lunar definition
   * @return the converter
   */
  public static TimeScaleConverter shipped(LunarTimeDefinition lunar) {
    return new TimeScaleConverter(TimeScaleRelations.de405(lunar), shippedLeapSeconds());
  }

  /**
   * The leap-second table shipped with the ground module, checked and activated.
   *
   * @return the table
   */
  public static LeapSecondTable shippedLeapSeconds() {
    try (InputStream in = Epochs.class.getResourceAsStream("leap-seconds.list")) {
      if (in == null) {
        throw new IllegalStateException("the shipped leap-second table is missing");
      }
      return LeapSecondsList.read("leap-seconds.list (shipped)", in.readAllBytes()).activeTable();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** @return the relations used (null when built without them) */
  public TimeScaleRelations relations() {
    return relations;
  }

  /**
   * Converts an event's labels.
   *
   * @param from the scale of the given labels
   * @param given the labels (for UTC inside a leap second: those of 23:59:59 plus the fraction)
   * @param leapSecond whether UTC labels name second 60
   * @param at where the event lies
   * @return the labels in every scale
   * @throws IllegalArgumentException when the instant lies outside the leap-second table (UTC) or
   *     outside the ephemeris (a scale that needs it)
   */
  public Converted convert(TimeScale from, SplitTime given, boolean leapSecond, Centre at) {
    final Map<TimeScale, SplitTime> out = new EnumMap<>(TimeScale.class);
    final SplitTime tcb;
    final SplitTime tt = new SplitTime();
    SplitTime tai = null;
    if (from.needsEphemeris()) {
      tcb = tcbFromEphemerisScale(from, given, at);
      final double tdb = tdbSeconds(tcb);
      final SplitTime tcg = copy(tcb);
      Instants.shift(tcg, -relations.tcbMinusTcgS(tdb, at));
      TimeScales.tcgToTt(tcg, tt);
    } else {
      tai = taiFrom(from, given, leapSecond);
      if (tai != null) {
        TimeScales.taiToTt(tai, tt);
      } else if (from == TimeScale.TCG) {
        TimeScales.tcgToTt(given, tt);
      } else {
        tt.setTo(given);
      }
      tcb = covered(tt) ? tcbFromTt(tt, at) : null;
    }
    if (tai == null) {
      tai = new SplitTime();
      TimeScales.ttToTai(tt, tai);
    }
    out.put(TimeScale.TT, tt);
    out.put(TimeScale.TAI, tai);
    final SplitTime tcg = new SplitTime();
    if (from == TimeScale.TCG) {
      tcg.setTo(given);
    } else {
      TimeScales.ttToTcg(tt, tcg);
    }
    out.put(TimeScale.TCG, tcg);
    for (TimeScale g : new TimeScale[] {TimeScale.GPS, TimeScale.GST, TimeScale.BDT}) {
      final SplitTime sys = new SplitTime();
      TimeScales.taiToSystem(tai, g.taiMinusSystemS(), sys);
      out.put(g, sys);
    }
    final SplitTime utc = new SplitTime();
    final int st = leaps.taiToUtc(tai, utc);
    if (Status.isUsable(st)) {
      out.put(TimeScale.UTC, utc);
    }
    if (tcb != null) {
      fillEphemerisScales(tcb, at, out);
    }
    return new Converted(at, out, st == Status.LEAP_SECOND_IN_PROGRESS, Status.name(st));
  }

  private void fillEphemerisScales(SplitTime tcb, Centre at, Map<TimeScale, SplitTime> out) {
    out.put(TimeScale.TCB, tcb);
    final SplitTime tdb = new SplitTime();
    TimeScales.tcbToTdb(tcb, tdb);
    out.put(TimeScale.TDB, tdb);
    final SplitTime tcl = copy(tcb);
    Instants.shift(tcl, -relations.tcbMinusTclS(tdb.toSecondsApprox(), at));
    out.put(TimeScale.TCL, tcl);
    final SplitTime tl = new SplitTime();
    Instants.require(TimeScales.tclToTl(tcl, relations.lunar().scaleRateL(), tl), "TCL to TL");
    out.put(TimeScale.TL, tl);
  }

  private boolean covered(SplitTime tt) {
    return relations != null && relations.covers(tt.toSecondsApprox() - 1.0) && relations.covers(tt.toSecondsApprox() + 1.0);
  }

  /** TAI of an atomic scale's labels, exactly (whole-second offsets); null for TT and TCG. */
  private SplitTime taiFrom(TimeScale from, SplitTime given, boolean leapSecond) {
    final SplitTime tai = new SplitTime();
    switch (from) {
      case TAI -> tai.setTo(given);
      case GPS, GST, BDT -> TimeScales.systemToTai(given, from.taiMinusSystemS(), tai);
      case UTC -> {
        final int st = leaps.utcToTai(given, tai);
        if (!Status.isUsable(st)) {
          throw new IllegalArgumentException("UTC instant outside the leap-second table (from 1972-01-01): "
              + Status.name(st));
        }
        if (leapSecond) {
          tai.addWholeSeconds(1);
        }
      }
      default -> {
        return null;
      }
    }
    return tai;
  }

  private SplitTime tcbFromTt(SplitTime tt, Centre at) {
    final SplitTime tcg = new SplitTime();
    TimeScales.ttToTcg(tt, tcg);
    final SplitTime tcb = copy(tcg);
    double tdb = tt.toSecondsApprox();
    for (int pass = 0; pass < PASSES; pass++) {
      tcb.setTo(tcg);
      Instants.shift(tcb, relations.tcbMinusTcgS(tdb, at));
      tdb = tdbSeconds(tcb);
    }
    return tcb;
  }

  private SplitTime tcbFromEphemerisScale(TimeScale from, SplitTime given, Centre at) {
    if (relations == null) {
      throw new IllegalArgumentException(from + " needs the ephemeris relations, which this converter was built without");
    }
    final SplitTime tcb = new SplitTime();
    switch (from) {
      case TCB -> tcb.setTo(given);
      case TDB -> TimeScales.tdbToTcb(given, tcb);
      case TCL, TL -> {
        final SplitTime tcl = new SplitTime();
        if (from == TimeScale.TL) {
          Instants.require(TimeScales.tlToTcl(given, relations.lunar().scaleRateL(), tcl), "TL to TCL");
        } else {
          tcl.setTo(given);
        }
        double tdb = tcl.toSecondsApprox();
        requireCovered(from, tdb);
        for (int pass = 0; pass < PASSES; pass++) {
          tcb.setTo(tcl);
          Instants.shift(tcb, relations.tcbMinusTclS(tdb, at));
          tdb = tdbSeconds(tcb);
        }
      }
      default -> throw new IllegalArgumentException("not a scale of the ephemeris: " + from);
    }
    requireCovered(from, tdbSeconds(tcb));
    return tcb;
  }

  private void requireCovered(TimeScale from, double tdbS) {
    if (!relations.covers(tdbS - 60.0) || !relations.covers(tdbS + 60.0)) {
      throw new IllegalArgumentException(from + " instant outside the DE405 span of the time relations "
          + "(TDB 1999-12-24 to 2040-01-25)");
    }
  }

  private static double tdbSeconds(SplitTime tcb) {
    final SplitTime tdb = new SplitTime();
    TimeScales.tcbToTdb(tcb, tdb);
    return tdb.toSecondsApprox();
  }

  private static SplitTime copy(SplitTime t) {
    return SplitTime.of(t.wholeSeconds(), t.fractionS());
  }

  /**
   * TL - TT for an event at a clock near the Moon: the event lies at x_M + r, so both 4-D
   * transformations carry their position terms (the TCL one vanishes at r = 0).
   *
   * @param tt the event's TT
   * @param selenocentricPositionM the clock's position from the Moon's centre, ICRF axes, m
   * @return TL - TT, s
   * @throws IllegalArgumentException outside the ephemeris span, or without relations
   */
  public double tlMinusTtAtClockS(SplitTime tt, double[] selenocentricPositionM) {
    if (!covered(tt)) {
      throw new IllegalArgumentException("TT instant outside the DE405 span of the time relations "
          + "(TDB 1999-12-24 to 2040-01-25)");
    }
    final SplitTime tcg = new SplitTime();
    TimeScales.ttToTcg(tt, tcg);
    final SplitTime tcb = new SplitTime();
    final double[] xm = new double[3];
    final double[] vm = new double[3];
    final double[] event = new double[3];
    final double[] offsets = new double[2];
    double tdb = tt.toSecondsApprox();
    for (int pass = 0; pass < PASSES; pass++) {
      relations.barycentricState(Centre.MOON, tdb, xm, vm);
      for (int i = 0; i < 3; i++) {
        event[i] = xm[i] + selenocentricPositionM[i];
      }
      relations.coordinateOffsets(tdb, event, offsets);
      tcb.setTo(tcg);
      Instants.shift(tcb, offsets[0]);
      tdb = tdbSeconds(tcb);
    }
    final SplitTime tl = copy(tcb);
    Instants.shift(tl, -offsets[1]);
    Instants.require(TimeScales.tclToTl(tl, relations.lunar().scaleRateL(), tl), "TCL to TL");
    return tl.secondsSince(tt);
  }
}
