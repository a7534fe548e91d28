package org.eigenzeit.bench.ops;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * Pins the operation counts published in docs/performance.md ("Operations per cycle"): the
 * onboard core's classes are loaded through a class loader that instruments them with {@link
 * OpCountTransformer} (what the agent does in {@code scripts/benchmarks.sh ops}), the harness
 * {@link OpsRun} counts one hour of cycles per configuration, and every published arithmetic
 * figure (mean, median cycle, worst cycle) must be met within 20 percent. The counts are
 * deterministic: a change of the core that moves them by more must regenerate the table.
 */
class OpsPinTest {
  /** Label, arithmetic per cycle: mean over 3600 cycles, median cycle, worst cycle (docs table). */
  private static final Object[][] PUBLISHED = {
      {"point mass", 104.2, 104, 174},
      {"point mass + tides", 219.3, 216, 371},
      {"J2", 120.2, 120, 190},
      {"J2 + tides", 235.3, 232, 387},
      {"degree 4", 343.2, 343, 413},
      {"degree 4 + tides", 458.3, 455, 610},
      {"degree 8", 653.2, 653, 723},
      {"degree 8 + tides", 768.3, 765, 920},
      {"degree 20", 2447.2, 2447, 2517},
      {"degree 20 + tides", 2562.3, 2559, 2714},
      {"degree 36", 6855.2, 6855, 6925},
      {"degree 36 + tides", 6970.3, 6967, 7122},
      {"point mass + servo", 328.2, 328, 398},
      {"point mass + tides + servo", 443.3, 440, 595},
      {"J2 + servo", 344.2, 344, 414},
      {"J2 + tides + servo", 459.3, 456, 611},
      {"degree 4 + servo", 567.2, 567, 637},
      {"degree 4 + tides + servo", 682.3, 679, 834},
      {"degree 8 + servo", 877.2, 877, 947},
      {"degree 8 + tides + servo", 992.3, 989, 1144},
      {"degree 20 + servo", 2671.2, 2671, 2741},
      {"degree 20 + tides + servo", 2786.3, 2783, 2938},
      {"degree 36 + servo", 7079.2, 7079, 7149},
      {"degree 36 + tides + servo", 7194.3, 7191, 7346},
  };

  /** Instruments org.eigenzeit.onboard, loads OpsRun child-first, shares everything else. */
  private static final class Instrumenting extends ClassLoader {
    Instrumenting(ClassLoader parent) {
      super(parent);
    }

    @Override
    protected Class<?> loadClass(String name, boolean resolve) throws ClassNotFoundException {
      final boolean core = name.startsWith("org.eigenzeit.onboard.");
      final boolean harness = name.startsWith(OpsRun.class.getName());
      if (!core && !harness) {
        return super.loadClass(name, resolve);
      }
      synchronized (getClassLoadingLock(name)) {
        final Class<?> done = findLoadedClass(name);
        if (done != null) {
          return done;
        }
        final byte[] bytes;
        try (InputStream in = getParent().getResourceAsStream(name.replace('.', '/') + ".class")) {
          if (in == null) {
            throw new ClassNotFoundException(name);
          }
          bytes = core ? OpCountTransformer.instrument(in.readAllBytes()) : in.readAllBytes();
        } catch (IOException e) {
          throw new ClassNotFoundException(name, e);
        }
        return defineClass(name, bytes, 0, bytes.length);
      }
    }
  }

  @Test
  void publishedCountsHold() throws Exception {
    final Class<?> run = Class.forName(OpsRun.class.getName(), true, new Instrumenting(OpsPinTest.class.getClassLoader()));
    final String[] labels = new String[PUBLISHED.length];
    final double[][] got = (double[][]) run.getMethod("summaries", int.class, String[].class).invoke(null, 3600, labels);
    assertEquals(PUBLISHED.length, got.length, "configurations");
    final String[] what = {"mean", "median", "worst"};
    for (int i = 0; i < got.length; i++) {
      assertEquals(PUBLISHED[i][0], labels[i], "configuration order");
      final String key = labels[i].toLowerCase(Locale.ROOT).replace(" + ", "_").replace(' ', '_');
      for (int j = 0; j < 3; j++) {
        final double published = ((Number) PUBLISHED[i][j + 1]).doubleValue();
        System.out.printf(Locale.ROOT, "evidence: ops.%s.%s = %.1f%n", key, what[j], got[i][j]);
        assertTrue(got[i][j] >= 0.8 * published && got[i][j] <= 1.2 * published,
            labels[i] + " " + what[j] + ": counted " + got[i][j] + ", published " + published);
      }
    }
  }
}
