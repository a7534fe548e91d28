/** Solar-system ephemerides for the ground reference: a JPL DE reader and the Sun/Moon provider. */
package org.eigenzeit.ground.ephemeris;
