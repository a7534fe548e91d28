package org.eigenzeit.ground.timescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.Map;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.status.Status;
import org.eigenzeit.onboard.time.SplitTime;
import org.eigenzeit.onboard.time.TimeScales;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/** Conversions of one event between every scale, at the geocentre and the selenocentre. */
class TimeScaleConverterTest {
  private static final TimeScaleConverter CONVERTER = new TimeScaleConverter(TimeRelationsFixture.get().relations,
      TimeScaleConverter.shippedLeapSeconds());

  private static SplitTime utc(String iso) {
    return CalendarLabels.parse("test", iso, true).labels();
  }

  @Test
  void everyScaleConvertsBackToTheSameEvent() {
    final double[] worst = new double[1];
    qt().withExamples(60).withFixedSeed(20261220L).forAll(doubles().between(3.2e7, 1.25e9))
        .checkAssert(ttS -> {
          for (Centre at : Centre.values()) {
            final SplitTime tt = SplitTime.of((long) Math.floor(ttS), ttS - Math.floor(ttS));
            final Map<TimeScale, SplitTime> all = CONVERTER.convert(TimeScale.TT, tt, false, at).labels();
            for (TimeScale s : TimeScale.values()) {
              final SplitTime back = CONVERTER.convert(s, all.get(s), false, at).labels().get(TimeScale.TT);
              worst[0] = Math.max(worst[0], Math.abs(back.secondsSince(tt)));
            }
          }
        });
    System.out.printf("evidence: timescale.convert_round_trip_s = %.3e%n", worst[0]);
    assertTrue(worst[0] < 5e-14, "round trip " + worst[0]); // measured 5.1e-15 s
  }

  @Test
  void utcAcrossTheLeapSecondOf2016() {
    // IERS Bulletin C 52: a leap second at the end of 2016-12-31; TAI - UTC = 37 s from 2017-01-01.
    final TimeScaleConverter.Converted c = CONVERTER.convert(TimeScale.UTC, utc("2016-12-31T23:59:60.5"), true, Centre.EARTH);
    assertEquals("2017-01-01T00:00:36.500", CalendarLabels.format(c.labels().get(TimeScale.TAI), 3, false));
    assertTrue(c.utcHeldInLeapSecond());
    assertEquals("2016-12-31T23:59:60.500", CalendarLabels.format(c.labels().get(TimeScale.UTC), 3, c.utcHeldInLeapSecond()));
    final TimeScaleConverter.Converted after = CONVERTER.convert(TimeScale.UTC, utc("2017-01-01T00:00:00"), false, Centre.EARTH);
    assertEquals("2017-01-01T00:00:37.000", CalendarLabels.format(after.labels().get(TimeScale.TAI), 3, false));
    assertFalse(after.utcHeldInLeapSecond());
    assertEquals("OK", after.utcStatus());
  }

  @Test
  void gnssSystemTimesKeepTheirNominalOffsets() {
    // Common practice since 2017-01-01 (TAI - UTC = 37 s): GPS time and GST = UTC + 18 s, BDT = UTC + 4 s.
    final Map<TimeScale, SplitTime> m = CONVERTER.convert(TimeScale.UTC, utc("2026-10-01T00:00:00"), false, Centre.EARTH).labels();
    final SplitTime u = m.get(TimeScale.UTC);
    assertEquals(18.0, m.get(TimeScale.GPS).secondsSince(u), 0.0);
    assertEquals(18.0, m.get(TimeScale.GST).secondsSince(u), 0.0);
    assertEquals(4.0, m.get(TimeScale.BDT).secondsSince(u), 0.0);
    assertEquals(69.184, m.get(TimeScale.TT).secondsSince(u), 1e-12);
    // Atomic labels pass through exactly (whole-second offsets; no detour through TT's 32.184 s).
    final SplitTime tai = SplitTime.of(844_128_000L, 0.5);
    final Map<TimeScale, SplitTime> a = CONVERTER.convert(TimeScale.TAI, tai, false, Centre.EARTH).labels();
    assertEquals(tai, a.get(TimeScale.TAI));
    assertEquals(SplitTime.of(844_128_000L - 19, 0.5), a.get(TimeScale.GPS));
    assertEquals(tai, CONVERTER.convert(TimeScale.GPS, a.get(TimeScale.GPS), false, Centre.EARTH).labels().get(TimeScale.TAI));
  }

  @Test
  void theSameEventSeenFromTheMoonCarriesTheEarthsVelocityTerm() {
    // TCB fixed, event at the Moon's centre versus the geocentre: TCG differs by v_E . (x_M - x_E)/c^2.
    // Independent estimate: SOFA epv00 (Earth's barycentric velocity) and moon98 (geocentric Moon).
    // Likewise TCL differs by v_M . (x_M - x_E)/c^2, v_M = v_E + the Moon's geocentric velocity.
    double worst = 0;
    double worstTcl = 0;
    double largest = 0;
    for (double days = 400.25; days < 14_500; days += 181.3) {
      final SplitTime tcb = SplitTime.of((long) Math.floor(days * 86_400), 0.0);
      final Map<TimeScale, SplitTime> atEarth = CONVERTER.convert(TimeScale.TCB, tcb, false, Centre.EARTH).labels();
      final Map<TimeScale, SplitTime> atMoon = CONVERTER.convert(TimeScale.TCB, tcb, false, Centre.MOON).labels();
      final SplitTime earth = atEarth.get(TimeScale.TCG);
      final SplitTime moon = atMoon.get(TimeScale.TCG);
      final double[][] pvh = new double[2][3];
      final double[][] pvb = new double[2][3];
      final double tdbDays = days - 20.0 / 86_400; // TDB is about 20 s behind TCB here; immaterial at this level
      JSOFA.jauEpv00(2_451_545.0, tdbDays, pvh, pvb);
      final double[][] moonPv = JSOFA.jauMoon98(2_451_545.0, tdbDays);
      double vr = 0;
      double vmr = 0;
      for (int i = 0; i < 3; i++) {
        vr += pvb[1][i] * moonPv[0][i];
        vmr += (pvb[1][i] + moonPv[1][i]) * moonPv[0][i];
      }
      final double au = 149_597_870_691.0;
      final double expected = vr * au * au / 86_400 / CentralBody.C2;
      worst = Math.max(worst, Math.abs(earth.secondsSince(moon) - expected));
      final double expectedTcl = vmr * au * au / 86_400 / CentralBody.C2;
      worstTcl = Math.max(worstTcl, Math.abs(atEarth.get(TimeScale.TCL).secondsSince(atMoon.get(TimeScale.TCL)) - expectedTcl));
      largest = Math.max(largest, Math.abs(expected));
    }
    System.out.printf("evidence: timescale.moon_event_term_vs_sofa_s = %.3e%n", worst);
    System.out.printf("evidence: timescale.moon_event_term_largest_s = %.3e%n", largest);
    System.out.printf("evidence: timescale.earth_event_tcl_term_vs_sofa_s = %.3e%n", worstTcl);
    assertTrue(worstTcl < 4.5e-8, "TCL " + worstTcl);
    // v_E about 29.8 km/s, lunar distance up to 406 000 km: at most 1.35e-4 s.
    assertTrue(largest > 1.2e-4 && largest < 1.35e-4, "largest " + largest);
    assertTrue(worst < 4.5e-8, "worst " + worst); // measured 4.8e-9 s: moon98 is good to about 100 km
  }

  @Test
  void conversionsMatchTheRelations() {
    final TimeScaleRelations rel = TimeRelationsFixture.get().relations;
    final SplitTime tt = SplitTime.of(844_128_000L, 0.5);
    final Map<TimeScale, SplitTime> e = CONVERTER.convert(TimeScale.TT, tt, false, Centre.EARTH).labels();
    final double tdb = e.get(TimeScale.TDB).toSecondsApprox();
    assertEquals(rel.tdbMinusTtGeocentreS(tdb), e.get(TimeScale.TDB).secondsSince(tt), 1e-14);
    final Map<TimeScale, SplitTime> m = CONVERTER.convert(TimeScale.TT, tt, false, Centre.MOON).labels();
    assertEquals(rel.tlMinusTtSelenocentreS(m.get(TimeScale.TDB).toSecondsApprox()), m.get(TimeScale.TL).secondsSince(tt), 1e-14);
    final SplitTime tcl = m.get(TimeScale.TCL);
    final SplitTime tl = new SplitTime();
    assertEquals(Status.OK, TimeScales.tclToTl(tcl, rel.lunar().scaleRateL(), tl));
    assertEquals(tl, m.get(TimeScale.TL));
  }

  @Test
  void outsideTheEphemerisOnlyTheAtomicScalesAreGiven() {
    final SplitTime tt2045 = SplitTime.of(45L * 365 * 86_400, 0.0);
    final Map<TimeScale, SplitTime> m = CONVERTER.convert(TimeScale.TT, tt2045, false, Centre.EARTH).labels();
    assertNull(m.get(TimeScale.TDB));
    assertNull(m.get(TimeScale.TL));
    assertTrue(m.containsKey(TimeScale.TCG) && m.containsKey(TimeScale.GPS));
    final String msg = assertThrows(IllegalArgumentException.class,
        () -> CONVERTER.convert(TimeScale.TL, tt2045, false, Centre.MOON)).getMessage();
    assertTrue(msg.contains("1999-12-24 to 2040-01-25"), msg);
    assertThrows(IllegalArgumentException.class, () -> CONVERTER.convert(TimeScale.TDB, tt2045, false, Centre.EARTH));
    final String utc = assertThrows(IllegalArgumentException.class,
        () -> CONVERTER.convert(TimeScale.UTC, utc("1969-06-01T00:00:00"), false, Centre.EARTH)).getMessage();
    assertTrue(utc.contains("leap-second table"), utc);
  }
}
