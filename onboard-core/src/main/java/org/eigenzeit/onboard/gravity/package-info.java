/**
 * Gravitational potentials on board: the spherical-harmonic coefficient table (load, validate,
 * activate), the geopotential evaluator, low-precision Sun and Moon positions and the lunisolar
 * tidal potential.
 */
package org.eigenzeit.onboard.gravity;
