package org.eigenzeit.onboard.arch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.lang.module.ModuleDescriptor;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/** The compiled module-info exports exactly the API packages and requires only java.base. */
class ModuleDescriptorTest {
  @Test
  void exportsOnlyApiAndRequiresOnlyJavaBase() throws IOException {
    final Path info = Path.of("target", "classes", "module-info.class");
    final ModuleDescriptor d;
    try (InputStream in = Files.newInputStream(info)) {
      d = ModuleDescriptor.read(in);
    }
    assertEquals("org.eigenzeit.onboard", d.name());
    final Set<String> requires = new TreeSet<>();
    d.requires().forEach(r -> requires.add(r.name()));
    assertEquals(Set.of("java.base"), requires);
    final Set<String> exports = new TreeSet<>();
    d.exports().forEach(e -> exports.add(e.source()));
    assertEquals(new TreeSet<>(Set.of(
        "org.eigenzeit.onboard.status", "org.eigenzeit.onboard.math", "org.eigenzeit.onboard.time",
        "org.eigenzeit.onboard.body", "org.eigenzeit.onboard.frames", "org.eigenzeit.onboard.gravity",
        "org.eigenzeit.onboard.relativity", "org.eigenzeit.onboard.restart", "org.eigenzeit.onboard.table",
        "org.eigenzeit.onboard.steering", "org.eigenzeit.onboard.timekeeper", "org.eigenzeit.onboard.tracker",
        "org.eigenzeit.onboard.tracker.validation", "org.eigenzeit.onboard.tracker.cadence",
        "org.eigenzeit.onboard.tracker.integration", "org.eigenzeit.onboard.tracker.bridging")), exports);
  }
}
