package org.eigenzeit.verification.faults;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The seeded-fault harness. Works in a scratch copy of the project that {@code
 * scripts/fault-check.sh} has built once ({@code test-compile} of every module, and each module's
 * test class path in {@code target/fault-classpath.txt}). For each fault, one at a time: check that
 * its snippet occurs exactly once (else STALE), apply it, recompile with the JDK's compiler (no
 * Error Prone, so it is quick) the main sources of the changed module and of every module between
 * it and the catching module, and the catching module's test sources, into an overlay directory
 * placed before the baseline classes; run the named tests in a fresh JVM; restore the file. The
 * tests must fail (CAUGHT). Tests that pass (NOT CAUGHT), a fault that does not compile (NOT
 * CAUGHT: a fault must compile), a selector that matches no test and a catching test that fails
 * without the fault (BASELINE FAILS) all make the run fail.
 */
@Command(name = "fault-check", mixinStandardHelpOptions = true,
    description = "Applies each seeded fault to a built scratch copy and checks that its tests fail.")
public final class FaultCheck implements Callable<Integer> {
  /** Module dependencies (a module's main code sees these modules' classes). */
  private static final Map<String, List<String>> DEPENDS_ON = Map.of("onboard-core", List.of(),
      "ground-sim", List.of("onboard-core"), "verification", List.of("onboard-core", "ground-sim"),
      "host-example", List.of("onboard-core"));
  private static final List<String> ORDER = List.of("onboard-core", "ground-sim", "verification", "host-example");

  @Option(names = "--root", required = true, description = "the built scratch copy of the project")
  private Path root;

  @Option(names = "--faults", description = "fault list (default: <root>/verification/faults.yaml)")
  private Path faultsFile;

  @Option(names = "--out", description = "directory for fault-check.csv and fault-check.md")
  private Path out;

  @Option(names = "--only", split = ",", description = "fault ids to run (default: all)")
  private List<String> only = new ArrayList<>();

  @Option(names = "--timeout-s", description = "per test run (default: ${DEFAULT-VALUE})")
  private int timeoutS = 600;

  @Option(names = "--write-docs", description = "rewrite the seeded-fault table of this docs file and exit")
  private Path writeDocs;

  /** The outcome for one fault. */
  record Outcome(Fault fault, String verdict, String detail) {}

  /**
   * Entry point.
   *
   * @param args command-line arguments
   */
  public static void main(String[] args) {
    System.exit(new CommandLine(new FaultCheck()).execute(args));
  }

  @Override
  public Integer call() throws Exception {
    final Path list = faultsFile != null ? faultsFile : root.resolve("verification").resolve("faults.yaml");
    final List<Fault> faults = FaultFile.read(list);
    if (writeDocs != null) {
      Files.writeString(writeDocs, FaultFile.withTable(Files.readString(writeDocs, StandardCharsets.UTF_8), faults),
          StandardCharsets.UTF_8);
      System.out.println("fault-check: table of " + faults.size() + " faults written to " + writeDocs);
      return 0;
    }
    final Path work = Files.createTempDirectory(root.toAbsolutePath(), ".fault-work");
    final List<Outcome> outcomes = new ArrayList<>();
    final Map<String, String> baseline = new LinkedHashMap<>();
    for (Fault f : faults) {
      if (!only.isEmpty() && !only.contains(f.id())) {
        continue;
      }
      outcomes.add(check(f, work, baseline));
      final Outcome o = outcomes.get(outcomes.size() - 1);
      System.out.printf(Locale.ROOT, "fault-check: %-8s %-11s %s%n", f.id(), o.verdict(), o.detail());
    }
    final String table = table(outcomes);
    System.out.print(table);
    if (out != null) {
      Files.createDirectories(out);
      Files.writeString(out.resolve("fault-check.csv"), csv(outcomes), StandardCharsets.UTF_8);
      Files.writeString(out.resolve("fault-check.md"), table, StandardCharsets.UTF_8);
    }
    final long caught = outcomes.stream().filter(o -> o.verdict().equals("CAUGHT")).count();
    System.out.printf(Locale.ROOT, "fault-check: %d faults, %d caught, %d not caught or stale%n", outcomes.size(),
        caught, outcomes.size() - caught);
    return caught == outcomes.size() && !outcomes.isEmpty() ? 0 : 1;
  }

  private Outcome check(Fault f, Path work, Map<String, String> baseline) throws IOException, InterruptedException {
    final String stale = FaultFile.staleReason(root, f);
    if (stale != null) {
      return new Outcome(f, "STALE", stale);
    }
    if (!DEPENDS_ON.containsKey(f.module()) || !DEPENDS_ON.containsKey(f.fileModule())) {
      return new Outcome(f, "STALE", "unknown module " + f.module() + " or " + f.fileModule());
    }
    final List<String> selectors = new ArrayList<>();
    for (String part : f.selectorParts()) {
      final String resolved = resolveClass(f.module(), part);
      if (resolved == null) {
        return new Outcome(f, "NO TESTS", "no test class for '" + part + "' in " + f.module());
      }
      selectors.add(resolved);
    }
    final String key = f.module() + " " + String.join(" ", selectors);
    if (!baseline.containsKey(key)) {
      final Run r = runTests(f.module(), List.of(), selectors, work.resolve("baseline.log"));
      baseline.put(key, r.status == 0 ? "" : r.summary);
    }
    if (!baseline.get(key).isEmpty()) {
      return new Outcome(f, "BASELINE FAILS", "the tests fail without the fault: " + baseline.get(key));
    }
    final Path file = root.resolve(f.file());
    final byte[] pristine = Files.readAllBytes(file);
    final Path overlay = work.resolve(f.id());
    try {
      final String text = new String(pristine, StandardCharsets.UTF_8);
      Files.writeString(file, text.replace(f.original(), f.replacement()), StandardCharsets.UTF_8);
      final List<Path> overlays = new ArrayList<>();
      for (String m : ORDER) {
        final boolean between = m.equals(f.fileModule())
            || DEPENDS_ON.get(m).contains(f.fileModule()) && (m.equals(f.module()) || DEPENDS_ON.get(f.module()).contains(m));
        if (!between) {
          continue;
        }
        final Path dir = overlay.resolve(m).resolve("classes");
        final String error = compile(m, "main", dir, overlays);
        if (error != null) {
          return new Outcome(f, "NOT CAUGHT", "the fault does not compile: " + error);
        }
        overlays.add(0, dir);
        copyResourceIfChanged(f, m, dir);
      }
      final Path testDir = overlay.resolve(f.module()).resolve("test-classes");
      final String error = compile(f.module(), "test", testDir, overlays);
      if (error != null) {
        return new Outcome(f, "NOT CAUGHT", "the tests do not compile with the fault: " + error);
      }
      overlays.add(0, testDir);
      final Run r = runTests(f.module(), overlays, selectors, overlay.resolve("test.log"));
      if (r.status == SelectedTests.FAILED) {
        return new Outcome(f, "CAUGHT", r.summary);
      }
      if (r.status == TIMED_OUT) {
        return new Outcome(f, "CAUGHT", "the tests timed out after " + timeoutS + " s");
      }
      if (r.status == SelectedTests.NOTHING_RAN) {
        return new Outcome(f, "NO TESTS", "the selector matched no test");
      }
      return new Outcome(f, "NOT CAUGHT", r.status == 0 ? "the tests passed: " + r.summary : "test run ended with status "
          + r.status + ": " + r.summary);
    } finally {
      Files.write(file, pristine);
    }
  }

  private void copyResourceIfChanged(Fault f, String module, Path classes) throws IOException {
    final String prefix = module + "/src/main/resources/";
    if (f.file().startsWith(prefix)) {
      final Path target = classes.resolve(f.file().substring(prefix.length()));
      final Path parent = target.getParent();
      if (parent != null) {
        Files.createDirectories(parent);
      }
      Files.copy(root.resolve(f.file()), target, StandardCopyOption.REPLACE_EXISTING);
    }
  }

  /** Resolves {@code Simple#m} or {@code pkg.Simple#m} to {@code pkg.Simple#m} from the module's test sources. */
  private String resolveClass(String module, String part) throws IOException {
    final int hash = part.indexOf('#');
    final String cls = hash < 0 ? part : part.substring(0, hash);
    final String rest = hash < 0 ? "" : part.substring(hash);
    final Path tests = root.resolve(module).resolve("src").resolve("test").resolve("java");
    final String simple = cls.substring(cls.lastIndexOf('.') + 1);
    try (Stream<Path> walk = Files.walk(tests)) {
      for (Path p : walk.filter(p -> String.valueOf(p.getFileName()).equals(simple + ".java")).sorted().toList()) {
        final String fqcn = tests.relativize(p).toString().replace(File.separatorChar, '.').replaceAll("\\.java$", "");
        if (!cls.contains(".") || fqcn.equals(cls)) {
          return fqcn + rest;
        }
      }
    }
    return null;
  }

  private List<String> baselineClassPath(String module) throws IOException {
    final List<String> cp = new ArrayList<>();
    final Path m = root.resolve(module);
    cp.add(m.resolve("target").resolve("test-classes").toString());
    cp.add(m.resolve("target").resolve("classes").toString());
    final Path file = m.resolve("target").resolve("fault-classpath.txt");
    if (!Files.isRegularFile(file)) {
      throw new IOException(file + " missing: build the scratch copy first (scripts/fault-check.sh does)");
    }
    for (String e : Files.readString(file, StandardCharsets.UTF_8).strip().split(File.pathSeparator)) {
      if (!e.isBlank()) {
        cp.add(e);
      }
    }
    return cp;
  }

  /** Compiles a module's main or test sources into dir; returns the first error or null. */
  private String compile(String module, String kind, Path dir, List<Path> overlays) throws IOException {
    final Path src = root.resolve(module).resolve("src").resolve(kind).resolve("java");
    final List<String> files;
    try (Stream<Path> walk = Files.walk(src)) {
      files = walk.filter(p -> p.toString().endsWith(".java") && !String.valueOf(p.getFileName()).equals("module-info.java"))
          .map(Path::toString).sorted().toList();
    }
    final List<String> cp = new ArrayList<>();
    overlays.forEach(o -> cp.add(o.toString()));
    final String own = root.resolve(module).resolve("target").resolve("main".equals(kind) ? "classes" : "test-classes")
        .toString();
    baselineClassPath(module).stream().filter(e -> !e.equals(own)).forEach(cp::add);
    Files.createDirectories(dir);
    final String release = "onboard-core".equals(module) && "main".equals(kind) ? "11" : "17";
    final List<String> args = new ArrayList<>(List.of("-d", dir.toString(), "-cp", String.join(File.pathSeparator, cp),
        "--release", release, "-proc:none", "-nowarn", "-Xlint:none", "-encoding", "UTF-8", "-g"));
    args.addAll(files);
    final JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
    final java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
    final int status = javac.run(null, java.io.OutputStream.nullOutputStream(), err, args.toArray(new String[0]));
    if (status == 0) {
      return null;
    }
    final String msg = err.toString(StandardCharsets.UTF_8);
    final String first = msg.lines().filter(l -> l.contains("error:")).findFirst().orElse(msg.strip());
    return first.replace(root.toString() + File.separator, "");
  }

  private static final int TIMED_OUT = -1;

  /** Status and one-line summary of a forked test run. */
  private record Run(int status, String summary) {}

  private Run runTests(String module, List<Path> overlays, List<String> selectors, Path log)
      throws IOException, InterruptedException {
    final List<String> cp = new ArrayList<>();
    overlays.forEach(o -> cp.add(o.toString()));
    cp.addAll(baselineClassPath(module));
    cp.add(root.resolve("verification").resolve("target").resolve("classes").toString());
    baselineClassPath("verification").stream().filter(e -> e.contains("junit-platform-launcher")).forEach(cp::add);
    final Path java = Path.of(System.getProperty("java.home"), "bin", "java");
    final List<String> cmd = new ArrayList<>(List.of(java.toString(), "-ea", "-Xss4m", "-cp",
        String.join(File.pathSeparator, cp), SelectedTests.class.getName()));
    cmd.addAll(selectors);
    final Path logDir = log.getParent();
    if (logDir != null) {
      Files.createDirectories(logDir);
    }
    final Process p = new ProcessBuilder(cmd).directory(root.resolve(module).toFile()).redirectErrorStream(true)
        .redirectOutput(log.toFile()).start();
    if (!p.waitFor(timeoutS, TimeUnit.SECONDS)) {
      p.destroyForcibly().waitFor();
      return new Run(TIMED_OUT, "timed out");
    }
    final List<String> lines = Files.readAllLines(log, StandardCharsets.UTF_8);
    final String summary = String.join("; ", lines.stream()
        .filter(l -> l.startsWith("selected tests:") || l.startsWith("failure:")).limit(2).toList());
    return new Run(p.exitValue(), summary.isEmpty() ? "no summary (see " + log + ")" : summary);
  }

  private static String table(List<Outcome> outcomes) {
    final StringBuilder b = new StringBuilder("| fault | caught by | verdict | detail |\n|---|---|---|---|\n");
    for (Outcome o : outcomes) {
      b.append("| ").append(o.fault().id()).append(" | ").append(o.fault().module()).append(": ")
          .append(o.fault().tests().replace("|", "\\|")).append(" | ").append(o.verdict()).append(" | ")
          .append(o.detail().replace("|", "\\|")).append(" |\n");
    }
    return b.toString();
  }

  private static String csv(List<Outcome> outcomes) {
    final StringBuilder b = new StringBuilder("fault,breaks,file,module,tests,verdict,detail\n");
    for (Outcome o : outcomes) {
      final Fault f = o.fault();
      b.append(String.join(",", q(f.id()), q(f.breaks()), q(f.file()), q(f.module()), q(f.tests()), q(o.verdict()),
          q(o.detail()))).append('\n');
    }
    return b.toString();
  }

  private static String q(String s) {
    return s.contains(",") || s.contains("\"") || s.contains("\n") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
  }
}
