/**
 * Numerical building blocks of the onboard core: the math mode switch (fast or bit-reproducible),
 * three-vector helpers on caller-owned arrays, and compensated summation.
 */
package org.eigenzeit.onboard.math;
