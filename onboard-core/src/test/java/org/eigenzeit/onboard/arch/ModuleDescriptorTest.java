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
    // Every package of the core is API (there are no internal packages): the exports are exactly
    // the packages that hold compiled classes.
    final Set<String> packages = new TreeSet<>();
    try (java.util.stream.Stream<Path> files = Files.walk(Path.of("target", "classes"))) {
      files.filter(f -> f.toString().endsWith(".class") && !f.getFileName().toString().equals("module-info.class"))
          .forEach(f -> packages.add(Path.of("target", "classes").relativize(f.getParent()).toString()
              .replace(java.io.File.separatorChar, '.')));
    }
    assertEquals(packages, exports);
    assertEquals(true, exports.contains("org.eigenzeit.onboard.tracker") && exports.size() >= 20, exports.toString());
  }
}
