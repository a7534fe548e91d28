package org.eigenzeit.ground.campaign;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Properties;
import java.util.TreeMap;
import java.util.jar.JarEntry;
import java.util.jar.JarInputStream;
import java.util.stream.Stream;
import org.eigenzeit.ground.scenario.Scenario;
import org.eigenzeit.onboard.time.SplitTime;

/**
 * The version of the code that produces a campaign's results. {@link #fingerprint()} is the
 * SHA-256 over the class files and data files of the ground simulator and the onboard core
 * (entry names and bytes, in name order, wherever they are loaded from: folders, their own jars or
 * one shaded job jar), so any change of code or data changes it and re-runs stored runs. {@link
 * #describe()} names the git commit recorded at build time when there is one, else the build's
 * version, and says which.
 */
public final class CodeVersion {
  private static final String GIT = "/org/eigenzeit/ground/build/git.properties";
  private static final String EXCLUDED = "org/eigenzeit/ground/build/";
  private static volatile CodeVersion current;

  private final String fingerprint;
  private final String describe;

  private CodeVersion(String fingerprint, String describe) {
    this.fingerprint = fingerprint;
    this.describe = describe;
  }

  /** @return the running code's version (computed once) */
  public static CodeVersion current() {
    CodeVersion c = current;
    if (c == null) {
      synchronized (CodeVersion.class) {
        c = current;
        if (c == null) {
          c = new CodeVersion(computeFingerprint(), computeDescription());
          current = c;
        }
      }
    }
    return c;
  }

  /** @return SHA-256 (hex) of the code and data */
  public String fingerprint() {
    return fingerprint;
  }

  /** @return "git COMMIT" (with " (working tree modified)" when so at build) or "build VERSION (no git commit recorded)" */
  public String describe() {
    return describe;
  }

  private static String computeDescription() {
    try (InputStream in = CodeVersion.class.getResourceAsStream(GIT)) {
      if (in != null) {
        final Properties p = new Properties();
        p.load(in);
        final String id = p.getProperty("git.commit.id", "");
        if (id.matches("[0-9a-f]{40}")) {
          return "git " + id + ("true".equals(p.getProperty("git.dirty")) ? " (working tree modified at build)" : "");
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    String v = "unknown";
    try (InputStream in = CodeVersion.class.getResourceAsStream("/META-INF/maven/org.eigenzeit/ground-sim/pom.properties")) {
      if (in != null) {
        final Properties p = new Properties();
        p.load(in);
        v = p.getProperty("version", v);
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return "build " + v + " (no git commit recorded)";
  }

  private static String computeFingerprint() {
    final TreeMap<String, byte[]> entries = new TreeMap<>();
    collect(Scenario.class, "org/eigenzeit/ground/", entries);
    collect(SplitTime.class, "org/eigenzeit/onboard/", entries);
    try {
      final MessageDigest md = MessageDigest.getInstance("SHA-256");
      for (var e : entries.entrySet()) {
        md.update(e.getKey().getBytes(StandardCharsets.UTF_8));
        md.update((byte) 0);
        md.update(e.getValue());
      }
      return HexFormat.of().formatHex(md.digest());
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
    }
  }

  private static void collect(Class<?> anchor, String prefix, TreeMap<String, byte[]> out) {
    try {
      final java.security.CodeSource cs = anchor.getProtectionDomain().getCodeSource();
      if (cs == null || cs.getLocation() == null) {
        throw new IllegalStateException("cannot locate the code of " + anchor.getName() + " to fingerprint it");
      }
      final Path src = Path.of(cs.getLocation().toURI());
      if (Files.isDirectory(src)) {
        final List<Path> files = new ArrayList<>();
        try (Stream<Path> s = Files.walk(src.resolve(prefix))) {
          s.filter(Files::isRegularFile).forEach(files::add);
        }
        for (Path f : files) {
          final String name = src.relativize(f).toString().replace('\\', '/');
          if (!name.startsWith(EXCLUDED)) {
            out.put(name, Files.readAllBytes(f));
          }
        }
      } else {
        try (JarInputStream jar = new JarInputStream(Files.newInputStream(src))) {
          for (JarEntry e = jar.getNextJarEntry(); e != null; e = jar.getNextJarEntry()) {
            if (!e.isDirectory() && e.getName().startsWith(prefix) && !e.getName().startsWith(EXCLUDED)) {
              final ByteArrayOutputStream b = new ByteArrayOutputStream();
              jar.transferTo(b);
              out.put(e.getName(), b.toByteArray());
            }
          }
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    } catch (URISyntaxException e) {
      throw new IllegalStateException("cannot locate the code of " + anchor.getName() + " to fingerprint it", e);
    }
  }
}
