/** Frequency-stability statistics: Allan, modified Allan and time deviation. */
package org.eigenzeit.ground.stats;
