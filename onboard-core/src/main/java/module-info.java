/**
 * Eigenzeit onboard core: allocation-free relativistic clock corrections for flight software.
 *
 * <p>Depends on {@code java.base} only. Every exported package is part of the public API;
 * nothing else is exported.
 */
module org.eigenzeit.onboard {
  exports org.eigenzeit.onboard.status;
  exports org.eigenzeit.onboard.math;
  exports org.eigenzeit.onboard.time;
  exports org.eigenzeit.onboard.body;
  exports org.eigenzeit.onboard.frames;
  exports org.eigenzeit.onboard.gravity;
  exports org.eigenzeit.onboard.relativity;
  exports org.eigenzeit.onboard.tracker;
  exports org.eigenzeit.onboard.tracker.validation;
  exports org.eigenzeit.onboard.tracker.cadence;
  exports org.eigenzeit.onboard.tracker.integration;
  exports org.eigenzeit.onboard.tracker.bridging;
  exports org.eigenzeit.onboard.restart;
  exports org.eigenzeit.onboard.table;
  exports org.eigenzeit.onboard.steering;
  exports org.eigenzeit.onboard.servo;
  exports org.eigenzeit.onboard.servo.gate;
  exports org.eigenzeit.onboard.servo.modes;
  exports org.eigenzeit.onboard.servo.law;
  exports org.eigenzeit.onboard.corrector;
  exports org.eigenzeit.onboard.corrector.rawclock;
  exports org.eigenzeit.onboard.lunartime;
}
