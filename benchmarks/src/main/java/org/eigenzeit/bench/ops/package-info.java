/**
 * Operation counts of the onboard core by bytecode instrumentation (ASM): a Java agent that counts
 * every floating-point arithmetic and comparison bytecode and every static call to
 * {@code java.lang.Math}, {@code StrictMath} and {@code Double} that the core's classes execute
 * (docs/performance.md, "Operations per cycle").
 */
package org.eigenzeit.bench.ops;
