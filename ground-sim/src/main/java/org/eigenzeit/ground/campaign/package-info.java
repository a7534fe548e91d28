/**
 * Scenarios (YAML, explicit units, validated with file, key, value and allowed range) and
 * campaigns: many scenarios times many seeds, in parallel, resumable, with progress.
 */
package org.eigenzeit.ground.campaign;
