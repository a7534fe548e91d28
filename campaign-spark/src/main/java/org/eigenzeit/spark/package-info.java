/**
 * Campaigns on Apache Spark: the runs of a campaign as Spark tasks, the outputs of the local runner
 * byte for byte. Spark stays in this module: the onboard core and the ground simulator do not see it.
 */
package org.eigenzeit.spark;
