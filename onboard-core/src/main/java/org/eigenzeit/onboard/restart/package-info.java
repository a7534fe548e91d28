/**
 * Warm restart: the whole model and servo state written to, and read from, a fixed-size byte
 * buffer protected by a CRC-32C, so that a processor reset resumes steering without a time step.
 */
package org.eigenzeit.onboard.restart;
