namespace TripTestLog.Domain.Settings;

/// <summary>
/// The constants of t = TMS x (k / ((I/Is)^alpha - 1) + c). IEC 60255-151:2009, Table 1 (IEC curves, c = 0) and
/// IEEE C37.112-1996, Table 1 (with k = A, alpha = p, c = B, and the time dial TD in place of TMS).
/// </summary>
/// <param name="Curve">The characteristic.</param>
/// <param name="K">k (IEC) or A (IEEE), in seconds.</param>
/// <param name="Alpha">alpha (IEC) or p (IEEE).</param>
/// <param name="C">c, the constant added (IEEE B); zero for the IEC curves.</param>
/// <param name="Source">The standard and table the constants come from.</param>
public sealed record IdmtConstants(IdmtCurve Curve, double K, double Alpha, double C, string Source)
{
    private const string Iec = "IEC 60255-151 Table 1";
    private const string Ieee = "IEEE C37.112 Table 1";

    /// <summary>The constants of every supported curve.</summary>
    public static IReadOnlyList<IdmtConstants> All { get; } =
    [
        new(IdmtCurve.StandardInverse, 0.14, 0.02, 0, Iec),
        new(IdmtCurve.VeryInverse, 13.5, 1.0, 0, Iec),
        new(IdmtCurve.ExtremelyInverse, 80.0, 2.0, 0, Iec),
        new(IdmtCurve.LongTimeInverse, 120.0, 1.0, 0, Iec),
        new(IdmtCurve.IeeeModeratelyInverse, 0.0515, 0.02, 0.1140, Ieee),
        new(IdmtCurve.IeeeVeryInverse, 19.61, 2.0, 0.491, Ieee),
        new(IdmtCurve.IeeeExtremelyInverse, 28.2, 2.0, 0.1217, Ieee),
    ];

    /// <summary>The constants of <paramref name="curve"/>.</summary>
    public static IdmtConstants For(IdmtCurve curve) => All.Single(c => c.Curve == curve);

    /// <summary>The operate time at <paramref name="multiple"/> x pickup with time multiplier <paramref name="tms"/>; null at or below pickup (no operation).</summary>
    public double? OperateSeconds(double multiple, double tms) =>
        multiple <= 1.0 ? null : tms * (K / (Math.Pow(multiple, Alpha) - 1.0) + C);
}
