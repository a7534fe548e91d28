/**
 * The top-level object a flight-software host owns: relativistic model, clock servo, parameter
 * table, corrected time, time stamps, housekeeping and warm restart, driven one cycle at a time.
 */
package org.eigenzeit.onboard.corrector;
