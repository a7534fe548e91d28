/** Quick relativistic budget of an orbit: the onboard core against the ground reference. */
package org.eigenzeit.ground.budget;
