package org.eigenzeit.ground.loop;

/**
 * The decimated per-run time series (written as timeseries.csv). Immutable: accessors return
 * copies.
 */
public final class TimeSeries {
  private final double[] tS;
  private final double[] timeErrorNs;
  private final int[] mode;
  private final double[] command;
  private final double[] estimatedPhaseNs;
  private final double[] trueRelativisticOffsetUs;
  private final double[] modelOffsetUs;
  private final int[] orbitStatus;

  TimeSeries(int n) {
    tS = new double[n];
    timeErrorNs = new double[n];
    mode = new int[n];
    command = new double[n];
    estimatedPhaseNs = new double[n];
    trueRelativisticOffsetUs = new double[n];
    modelOffsetUs = new double[n];
    orbitStatus = new int[n];
  }

  void row(int i, double t, double errNs, int m, double cmd, double estNs, double trueUs, double modelUs, int orbit) {
    tS[i] = t;
    timeErrorNs[i] = errNs;
    mode[i] = m;
    command[i] = cmd;
    estimatedPhaseNs[i] = estNs;
    trueRelativisticOffsetUs[i] = trueUs;
    modelOffsetUs[i] = modelUs;
    orbitStatus[i] = orbit;
  }

  /** @return number of rows */
  public int size() {
    return tS.length;
  }

  /** @return time from the start, s */
  public double[] tS() {
    return tS.clone();
  }

  /** @return corrected time minus true scale, ns */
  public double[] timeErrorNs() {
    return timeErrorNs.clone();
  }

  /** @return servo mode codes */
  public int[] mode() {
    return mode.clone();
  }

  /** @return frequency commands */
  public double[] command() {
    return command.clone();
  }

  /** @return the servo's phase estimates, ns */
  public double[] estimatedPhaseNs() {
    return estimatedPhaseNs.clone();
  }

  /** @return true tau - T_scale, us */
  public double[] trueRelativisticOffsetUs() {
    return trueRelativisticOffsetUs.clone();
  }

  /** @return onboard model tau - T_scale, us */
  public double[] modelOffsetUs() {
    return modelOffsetUs.clone();
  }

  /** @return orbit solution status codes */
  public int[] orbitStatus() {
    return orbitStatus.clone();
  }

  /**
   * CSV text with a header line (comma-separated, '.' decimal separator).
   *
   * @return the CSV
   */
  public String toCsv() {
    final StringBuilder sb = new StringBuilder(64 * tS.length + 128);
    sb.append("t_s,time_error_ns,mode,command,estimated_phase_ns,true_relativistic_offset_us,model_offset_us,orbit_status\n");
    for (int i = 0; i < tS.length; i++) {
      sb.append(tS[i]).append(',').append(timeErrorNs[i]).append(',').append(mode[i]).append(',').append(command[i])
          .append(',').append(estimatedPhaseNs[i]).append(',').append(trueRelativisticOffsetUs[i]).append(',')
          .append(modelOffsetUs[i]).append(',').append(orbitStatus[i]).append('\n');
    }
    return sb.toString();
  }
}
