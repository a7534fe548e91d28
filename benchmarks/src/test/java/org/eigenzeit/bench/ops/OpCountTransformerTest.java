package org.eigenzeit.bench.ops;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.IOException;
import java.io.InputStream;
import java.lang.reflect.Method;
import org.junit.jupiter.api.Test;

/**
 * The operation counter on a class whose count is known from its source ({@code fixture.Tiny},
 * counted by hand in its comments): the instrumented class must report exactly that count, and
 * compute the same result as the original.
 */
class OpCountTransformerTest {
  private static final String FIXTURE = "org.eigenzeit.bench.ops.fixture.Tiny";

  /** Loads the fixture, instrumented, in a loader of its own (the counter stays shared). */
  private static Class<?> instrumentedFixture() throws IOException, ClassNotFoundException {
    final byte[] original;
    try (InputStream in = OpCountTransformerTest.class.getResourceAsStream("fixture/Tiny.class")) {
      original = in.readAllBytes();
    }
    final byte[] rewritten = new OpCountTransformer("org/eigenzeit/bench/ops/fixture/")
        .transform(null, "org/eigenzeit/bench/ops/fixture/Tiny", null, null, original);
    final ClassLoader loader = new ClassLoader(OpCountTransformerTest.class.getClassLoader()) {
      @Override
      protected Class<?> loadClass(String name, boolean resolve) throws ClassNotFoundException {
        if (name.equals(FIXTURE)) {
          synchronized (getClassLoadingLock(name)) {
            final Class<?> done = findLoadedClass(name);
            return done != null ? done : defineClass(name, rewritten, 0, rewritten.length);
          }
        }
        return super.loadClass(name, resolve);
      }
    };
    return Class.forName(FIXTURE, true, loader);
  }

  private static long[] delta(long[] before, long[] after) {
    final long[] d = new long[after.length];
    for (int i = 0; i < d.length; i++) {
      d[i] = after[i] - before[i];
    }
    return d;
  }

  @Test
  void countsTheKnownOperationsOfTheFixture() throws Exception {
    final Method work = instrumentedFixture().getMethod("work", double.class, double.class, int.class);
    final int n = 7;
    final long[] before = OpCounter.snapshot();
    final double got = (double) work.invoke(null, 0.25, 3.0, n);
    final long[] d = delta(before, OpCounter.snapshot());
    System.out.printf("fixture counts: add %d mul %d sub %d div %d neg %d cmp %d conv %d%n", OpCounter.count(d, "add"),
        OpCounter.count(d, "mul"), OpCounter.count(d, "sub"), OpCounter.count(d, "div"), OpCounter.count(d, "neg"),
        OpCounter.count(d, "cmp"), OpCounter.count(d, "conv"));
    // By hand from the source (fixture.Tiny comments), a < b, n passes of the loop:
    assertEquals(1 + n + 1 + 2, OpCounter.count(d, "add"), "DADD");
    assertEquals(1 + n, OpCounter.count(d, "mul"), "DMUL");
    assertEquals(1, OpCounter.count(d, "sub"), "DSUB");
    assertEquals(1, OpCounter.count(d, "div"), "DDIV");
    assertEquals(1, OpCounter.count(d, "neg"), "DNEG (the second one is on the branch not taken)");
    assertEquals(1, OpCounter.count(d, "cmp"), "DCMPG");
    assertEquals(n + 1, OpCounter.count(d, "conv"), "I2D");
    assertEquals(1, OpCounter.count(d, "Math.sqrt"));
    assertEquals(1, OpCounter.count(d, "Math.abs"));
    assertEquals(1, OpCounter.count(d, "StrictMath.sin"));
    assertEquals(1, OpCounter.count(d, "Double.isFinite"));
    assertEquals(0, OpCounter.count(d, "fadd") + OpCounter.count(d, "rem"), "nothing else");
    // the instrumented code computes what the original does (same arithmetic, same order)
    assertEquals(Double.doubleToLongBits(org.eigenzeit.bench.ops.fixture.Tiny.work(0.25, 3.0, n)),
        Double.doubleToLongBits(got));
    // and the counter does not count itself or any class outside the prefix
    final long[] before2 = OpCounter.snapshot();
    org.eigenzeit.bench.ops.fixture.Tiny.work(0.25, 3.0, n);
    final long[] d2 = delta(before2, OpCounter.snapshot());
    assertEquals(0, java.util.Arrays.stream(d2).sum(), "uninstrumented copy counted");
  }

  @Test
  void otherBranchAndLoopCountsScale() throws Exception {
    final Method work = instrumentedFixture().getMethod("work", double.class, double.class, int.class);
    final long[] before = OpCounter.snapshot();
    work.invoke(null, 5.0, 3.0, 100);
    final long[] d = delta(before, OpCounter.snapshot());
    assertEquals(2, OpCounter.count(d, "neg"), "a >= b takes the negation");
    assertEquals(1 + 100 + 1 + 2, OpCounter.count(d, "add"));
    assertEquals(101, OpCounter.count(d, "mul"));
  }

  @Test
  void classesOutsideThePrefixAreLeftAlone() {
    final OpCountTransformer t = new OpCountTransformer("org/eigenzeit/onboard/");
    assertNull(t.transform(null, "org/eigenzeit/bench/ops/fixture/Tiny", null, null, new byte[0]));
  }
}
