package org.eigenzeit.verification.evidence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * SHA-256 checksums of the inputs the verification depends on: the requirements file and every
 * data file the modules carry ({@code <module>/src/main/resources} and {@code src/test/resources}).
 */
final class Inputs {
  private Inputs() {}

  /**
   * Checksums by path relative to the root, sorted.
   *
   * @param root the project root
   * @param requirements the requirements file
   * @return path to hex SHA-256
   * @throws IOException when a file cannot be read
   */
  static Map<String, String> checksums(Path root, Path requirements) throws IOException {
    final List<Path> files = new ArrayList<>();
    files.add(requirements);
    try (Stream<Path> modules = Files.list(root)) {
      for (Path m : modules.sorted().toList()) {
        for (String kind : new String[] {"main", "test"}) {
          final Path res = m.resolve("src").resolve(kind).resolve("resources");
          if (Files.isDirectory(res)) {
            try (Stream<Path> walk = Files.walk(res)) {
              walk.filter(Files::isRegularFile).forEach(files::add);
            }
          }
        }
      }
    }
    final Map<String, String> out = new TreeMap<>();
    for (Path f : files) {
      final Path abs = f.toAbsolutePath().normalize();
      final Path base = root.toAbsolutePath().normalize();
      final String name = abs.startsWith(base) ? base.relativize(abs).toString().replace('\\', '/') : abs.toString();
      out.put(name, sha256(f));
    }
    return out;
  }

  static String sha256(Path f) throws IOException {
    final MessageDigest md;
    try {
      md = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IOException("SHA-256 unavailable", e);
    }
    try (InputStream in = new DigestInputStream(Files.newInputStream(f), md)) {
      in.transferTo(java.io.OutputStream.nullOutputStream());
    }
    return HexFormat.of().formatHex(md.digest());
  }
}
