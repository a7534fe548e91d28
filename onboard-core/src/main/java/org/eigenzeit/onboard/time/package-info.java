/**
 * Time on board: a two-part instant that keeps sub-picosecond resolution over centuries without
 * allocating, the scales TAI, TT, TCG, a GNSS-style system time and UTC (through an uploadable
 * leap-second table), and the CCSDS Unsegmented Time Code.
 *
 * <p>No {@code java.time} on the hot path. Every conversion writes into a caller-owned {@link
 * org.eigenzeit.onboard.time.SplitTime}.
 */
package org.eigenzeit.onboard.time;
