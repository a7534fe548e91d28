package org.eigenzeit.ground.gnss;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * The real GNSS days of the test resources ({@code /gnss/days/<day>/}, see its PROVENANCE.md),
 * each file classified by its content, not its name: SP3 (line 1 starts with #c or #d), RINEX
 * navigation (type N or G in column 21) or RINEX clock (type C).
 */
public final class GnssFixtures {
  /** What a file is. */
  public enum Kind {
    /** Precise orbit. */
    SP3,
    /** Broadcast navigation. */
    NAV,
    /** Clock. */
    CLOCK,
    /** Anything else. */
    OTHER
  }

  private GnssFixtures() {}

  /**
   * The folder of a resource.
   *
   * @param resource resource path such as "/gnss/days"
   * @return the folder
   */
  public static Path resource(String resource) {
    try {
      return Path.of(GnssFixtures.class.getResource(resource).toURI());
    } catch (URISyntaxException e) {
      throw new IllegalStateException(e);
    }
  }

  /**
   * Every fixture day.
   *
   * @return the day folders, sorted
   * @throws IOException when the folder cannot be listed
   */
  public static List<Path> days() throws IOException {
    try (Stream<Path> s = Files.list(resource("/gnss/days"))) {
      return s.filter(Files::isDirectory).sorted().toList();
    }
  }

  /**
   * One day.
   *
   * @param day e.g. "2010-07-01"
   * @return the folder
   */
  public static Path day(String day) {
    return resource("/gnss/days/" + day);
  }

  /**
   * The files of a day of one kind.
   *
   * @param day the folder
   * @param kind the kind
   * @return the files, sorted by name
   * @throws IOException when the folder cannot be listed
   */
  public static List<Path> files(Path day, Kind kind) throws IOException {
    final List<Path> out = new ArrayList<>();
    try (Stream<Path> s = Files.list(day)) {
      for (Path p : s.sorted().toList()) {
        if (kind(p) == kind) {
          out.add(p);
        }
      }
    }
    return out;
  }

  /**
   * The kind of a file, from its first line.
   *
   * @param p the file
   * @return the kind
   */
  public static Kind kind(Path p) {
    if (!Files.isRegularFile(p) || p.getFileName().toString().endsWith(".md")) {
      return Kind.OTHER;
    }
    final String first = GnssFiles.lines(p).get(0);
    if (first.startsWith("#c") || first.startsWith("#d")) {
      return Kind.SP3;
    }
    if (first.length() > 20 && first.contains("RINEX VERSION / TYPE")) {
      final char type = first.charAt(20);
      return type == 'C' ? Kind.CLOCK : (type == 'N' || type == 'G') ? Kind.NAV : Kind.OTHER;
    }
    return Kind.OTHER;
  }

  /**
   * The lines of a fixture file.
   *
   * @param day e.g. "2010-07-01"
   * @param file e.g. "brdc1820.10n.gz"
   * @return the lines (a mutable copy)
   */
  public static List<String> lines(String day, String file) {
    return new ArrayList<>(GnssFiles.lines(day(day).resolve(file)));
  }
}
