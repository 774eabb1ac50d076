namespace TripTestLog.Domain.Envelopes;

/// <summary>Straight lines on log-log axes, the way time-current characteristics are drawn.</summary>
internal static class LogLog
{
    /// <summary>The time at <paramref name="x"/> on the line through (x0, t0) and (x1, t1); all values above zero.</summary>
    public static double Interpolate(double x, double x0, double t0, double x1, double t1)
    {
        var f = (Math.Log(x) - Math.Log(x0)) / (Math.Log(x1) - Math.Log(x0));
        return Math.Exp(Math.Log(t0) + f * (Math.Log(t1) - Math.Log(t0)));
    }

    /// <summary>The time at <paramref name="x"/> on I²t = constant through (x0, t0): t = t0 (x0 / x)².</summary>
    public static double ConstantI2T(double x, double x0, double t0) => t0 * (x0 / x) * (x0 / x);
}
