package org.eigenzeit.ground.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.Locale;
import org.eigenzeit.ground.budget.BudgetResult;
import org.eigenzeit.ground.budget.LunarBudget;
import org.eigenzeit.ground.budget.LunarSurfaceClock;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.ground.input.InputException;
import org.eigenzeit.ground.input.TextFields;
import org.eigenzeit.ground.trajectory.Epochs;
import org.eigenzeit.onboard.body.CentralBody;
import org.eigenzeit.onboard.relativity.ModelConfig;
import org.eigenzeit.onboard.time.SplitTime;

/** The lunar parts of {@code eigenzeit budget}: a lunar clock against TL and TT. */
final class LunarBudgetOutput {
  private LunarBudgetOutput() {}

  /** Prints the budget of a lunar orbit against TL (as for any orbit) and against TT. */
  static void orbit(BudgetResult r, OrbitSpec orbit, SplitTime t0, double spanS, double stepS, ModelConfig cfg,
      boolean json, PrintWriter out) throws JsonProcessingException {
    final LunarBudget.AgainstTt tt = LunarBudget.againstTt(orbit, t0, spanS, stepS, cfg);
    if (json) {
      final ObjectNode n = BudgetCommand.mapper().valueToTree(r);
      n.set("againstTt", BudgetCommand.mapper().valueToTree(tt));
      n.put("caution", Caution.TEXT);
      out.println(BudgetCommand.mapper().writeValueAsString(n));
      return;
    }
    BudgetCommand.printTable(out, r);
    out.printf(Locale.ROOT, "  against TT (TL with L_L = %.6e; core: its offset against TL plus the onboard lunar table)%n",
        tt.scaleRateL());
    row(out, "mean fractional frequency", tt.coreMeanRate(), tt.referenceMeanRate());
    out.printf(Locale.ROOT, "  %-28s %16.6f %16.6f%n", "  as microseconds per day", tt.coreMeanRate() * 86400e6,
        tt.referenceMeanRate() * 86400e6);
    out.printf(Locale.ROOT, "  %-28s %16.4f %16.4f  ns%n", "periodic part, peak to peak", tt.corePeriodicPeakToPeakS() * 1e9,
        tt.referencePeriodicPeakToPeakS() * 1e9);
    out.printf(Locale.ROOT, "  %-28s %16.3f  ps (largest |core - ref| offset against TT)%n", "offset difference",
        tt.maxOffsetDifferenceS() * 1e12);
    out.printf(Locale.ROOT, "  d(TL - TT)/dTT at the clock %.10e (%.6f us/day); position term %.3f ns peak to peak%n",
        tt.tlMinusTtMeanRate(), tt.tlMinusTtMeanRate() * 86400e6, tt.positionTermPeakToPeakS() * 1e9);
    out.printf(Locale.ROOT, "  lunar table for the span: degree %d, %d segment(s), accuracy %.1e s; core vs ground %.2e s%n",
        tt.tableDegree(), tt.tableSegments(), tt.tableAccuracyS(), tt.tableMaxErrorS());
    out.println(Caution.TEXT);
  }

  private static void row(PrintWriter out, String name, double core, double ref) {
    out.printf(Locale.ROOT, "  %-28s %16.6e %16.6e %12.2e%n", name, core, ref, core - ref);
  }

  /** Runs and prints the budget of a clock fixed on the Moon. */
  static int surface(BudgetCommand c, CentralBody cb, PrintWriter out) throws JsonProcessingException {
    if (cb.centre() != CentralBody.CENTRE_MOON) {
      throw new InputException("--surface-site", 0, "a surface site needs --body moon, found --body " + c.body);
    }
    if (!(c.spanH > 0 && c.spanH <= 240) || !(c.stepS >= 1 && c.stepS <= 600)) {
      throw new picocli.CommandLine.ParameterException(c.spec.commandLine(),
          "--span-h must be in (0, 240], --step-s in [1, 600]");
    }
    final String[] f = c.orbit.surfaceSite;
    if (f.length != 3) {
      throw new InputException("--surface-site", 0, "found " + f.length + " values, allowed three: latitude,longitude,height");
    }
    final LunarSurfaceClock.Site site = new LunarSurfaceClock.Site(
        TextFields.decimal("--surface-site", 0, "latitude, deg", f[0], -90, 90),
        TextFields.decimal("--surface-site", 0, "longitude, deg", f[1], -180, 360),
        TextFields.decimal("--surface-site", 0, "height, m", f[2], -12_000, 12_000));
    final SplitTime t0 = Epochs.parse(c.epoch, c.timeScale);
    final LunarSurfaceClock.Result r = LunarSurfaceClock.analyse(site, t0, c.spanH * 3600, c.stepS, cb);
    if (c.json) {
      final ObjectNode n = BudgetCommand.mapper().valueToTree(r);
      n.put("caution", Caution.TEXT);
      out.println(BudgetCommand.mapper().writeValueAsString(n));
    } else {
      out.printf(Locale.ROOT, "budget: clock on the Moon at %.4f deg, %.4f deg, %.1f m, span %.1f h (ground reference)%n",
          site.latitudeDeg(), site.longitudeDeg(), site.heightM(), r.spanS() / 3600);
      out.printf(Locale.ROOT, "  %-28s %16s %16s%n", "", "against TL", "against TT");
      out.printf(Locale.ROOT, "  %-28s %16.6e %16.6e%n", "mean fractional frequency", r.meanRateTl(), r.meanRateTt());
      out.printf(Locale.ROOT, "  %-28s %16.6f %16.6f%n", "  as microseconds per day", r.secondsPerDayTl() * 1e6,
          r.secondsPerDayTt() * 1e6);
      out.printf(Locale.ROOT, "  %-28s %16.4f %16.4f  ns%n", "periodic part, peak to peak", r.periodicPeakToPeakTlS() * 1e9,
          r.periodicPeakToPeakTtS() * 1e9);
      out.printf(Locale.ROOT, "  components against TL: kinematic %.3e, gravitational %.3e, J2 %.3e, tidal %.3e (L_L = %.6e)%n",
          r.kinematic(), r.gravitational(), r.harmonics(), r.tidal(), r.scaleRateL());
      out.println("  The onboard core is not run for a surface clock (its tracker integrates free-fall orbits).");
      out.println(Caution.TEXT);
    }
    out.flush();
    return 0;
  }
}
