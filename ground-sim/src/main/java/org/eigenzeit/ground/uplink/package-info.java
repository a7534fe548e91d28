/**
 * Ground-side decoders and writers of the onboard core's uplink tables: the IERS/NIST
 * leap-seconds.list (hash and structure checked), coefficient files of a gravity field, and table
 * specifications in YAML, each turned into the binary image the core loads and checked by the
 * core's own content rules before it is written.
 */
package org.eigenzeit.ground.uplink;
