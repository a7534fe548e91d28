/**
 * Real GNSS data end to end: readers of what {@code org.eigenzeit.ground.trajectory} does not
 * read (SP3 headers and prediction flags, RINEX 2 navigation files of GPS, QZSS and GLONASS,
 * RINEX clock files), validation of broadcast records against precise orbits, and the
 * per-satellite survey of the relativistic clock terms behind {@code eigenzeit gnss-relativity}.
 */
package org.eigenzeit.ground.gnss;
