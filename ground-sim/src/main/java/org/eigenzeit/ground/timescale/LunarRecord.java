package org.eigenzeit.ground.timescale;

/**
 * What a Moon-centred run recorded about lunar time, at every output row: the core's TL - TT at the
 * clock against the ground's relation along DE405 ({@code TimeScaleConverter#tlMinusTtAtClockS} at
 * the true TT and the true position), and the core's corrected time in TT against the true TT.
 *
 * @param uplinkStatus the core's verdict on the uplinked table (a Status name; "none" when the
 *     scenario uplinks none)
 * @param tableAccuracyS the accuracy the fitted table states, s
 * @param tableStartTtS table span start, TT s since J2000.0
 * @param tableEndTtS table span end
 * @param rowsValid output rows with a current core value
 * @param rowsHeld output rows where the core held (flagged) its value
 * @param maxTableErrorS max |core TL - TT - ground TL - TT| over the valid rows, s (NaN: none)
 * @param maxTtErrorS max |core TT - true TT| over the valid rows, s (NaN: none)
 * @param tlMinusTtEndS the core's TL - TT at the last cycle, s (held if flagged)
 * @param clockMinusTtEndS the clock's accumulated offset against TT at the last cycle, s: the true
 *     proper-time offset against TL plus the change of TL - TT at the clock since the start
 * @param lastStatus the core's lunar status at the last cycle (a Status name)
 * @param heldCycles cycles the core counted as held
 * @param outOfSpan evaluations refused outside the table's span
 * @param notReady evaluations refused with no table active
 */
public record LunarRecord(String uplinkStatus, double tableAccuracyS, long tableStartTtS, long tableEndTtS,
    int rowsValid, int rowsHeld, double maxTableErrorS, double maxTtErrorS, double tlMinusTtEndS,
    double clockMinusTtEndS, String lastStatus, int heldCycles, int outOfSpan, int notReady) {}
