package org.eigenzeit.ground.cli;

import java.util.List;
import org.eigenzeit.ground.budget.OrbitSpec;
import org.eigenzeit.onboard.body.CentralBody;

/**
 * The built-in demo missions. All are invented for Eigenzeit's demonstrations; their orbits are
 * typical of their classes, not those of any real satellite.
 */
final class DemoScenarios {
  /**
   * A demo mission.
   *
   * @param name its name (and its scenario file's)
   * @param story what it carries
   * @param orbit its orbit
   * @param levels whether the demo runs it at every model level
   */
  record Demo(String name, String story, OrbitSpec orbit, boolean levels) {}

  private DemoScenarios() {}

  /** @return the names of the missions the demo runs at every model level */
  static List<String> levelMissions() {
    return all().stream().filter(Demo::levels).map(Demo::name).toList();
  }

  static List<Demo> all() {
    return List.of(
        new Demo("sorvelin-leo", "550 km sun-synchronous smallsat, quartz oscillator steered from its GNSS timing receiver",
            OrbitSpec.fromElements(CentralBody.EARTH, 6_928_137.0, 0.0012, 97.6, 30, 90, 0), false),
        new Demo("tamberlode-meo", "MEO navigation satellite (e = 0.01), rubidium clock coasting between ground contacts",
            OrbitSpec.fromElements(CentralBody.EARTH, 27_900_000.0, 0.010, 56, 120, 40, 10), true),
        new Demo("quendrisk-heo", "eccentric orbit (e = 0.16) with a passive hydrogen maser",
            OrbitSpec.fromElements(CentralBody.EARTH, 26_000_000.0, 0.16, 50, 200, 270, 0), false),
        new Demo("obrellan-geo", "GEO time-transfer payload",
            OrbitSpec.fromElements(CentralBody.EARTH, 42_164_170.0, 0.0002, 0.05, 0, 0, 75), false),
        new Demo("marrowtide-lunar", "lunar orbiter realising a lunar time scale (Eigenzeit's TT-like TL)",
            OrbitSpec.fromElements(CentralBody.MOON, 1_838_000.0, 0.01, 90, 0, 0, 0), false),
        new Demo("vellicorn-polar", "500 km polar orbiter, passive hydrogen maser coasting through a 12 h measurement gap",
            OrbitSpec.fromElements(CentralBody.EARTH, 6_878_000.0, 0.001, 89, 10, 0, 0), true));
  }
}
