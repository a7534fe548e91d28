/** JMH benchmarks: the onboard core's cycle at each model level, CUC, the reference, a campaign. */
package org.eigenzeit.bench;
