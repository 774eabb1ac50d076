namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// How far a standard point's time limit may move when the test current is a little off the point's, in the test's
/// favour only, by what physics allows a compliant release. A limit never moves the other way.
/// <para>
/// Thermal release: a first-order thermal model, t = τ ln(M² / (M² − Mc²)) from cold, where Mc is the release's
/// ultimate tripping multiple. The standard's own points bound Mc: it must trip at its conventional tripping current
/// (IEC 60898-1 Table 7 b, 1.45 In; IEC 60947-2 8.3.3, 1.30 Ir), so Mc is at most that multiple, and at least the
/// conventional non-tripping one. The ratio t(M) / t(Mp) grows as Mc rises, so the largest stretch of a trip-by limit
/// (test below the point) and the largest shrink of a no-trip limit (test above it) both come at the highest Mc the
/// standard allows. The stretch is never less than I²t = constant's, the model's own limit far above Mc. At or below
/// the highest Mc a compliant release may never trip at all, so a trip-by limit no longer holds there; above a no-trip
/// point that lies below the highest Mc, the release may trip at any time, so its no-trip limit no longer holds.
/// </para>
/// <para>Threshold release (magnetic, instantaneous): it acts or not at its threshold, which may sit anywhere past the
/// point, so a trip-by limit says nothing below its point and a no-trip limit nothing above it.</para>
/// </summary>
public static class OffsetBound
{
    /// <summary>
    /// The factor (at least 1, or +∞ when no limit remains) by which a trip-by limit stated at <paramref name="pointMultiple"/>
    /// may lengthen for a test at the lower <paramref name="testMultiple"/>; <paramref name="highestUltimate"/> is the highest
    /// ultimate tripping multiple a compliant thermal release may have, or null for a threshold release.
    /// </summary>
    public static double Stretch(double testMultiple, double pointMultiple, double? highestUltimate)
    {
        if (testMultiple >= pointMultiple)
        {
            return 1.0;
        }

        if (highestUltimate is not { } u || testMultiple <= u * (1 + 1e-9))
        {
            return double.PositiveInfinity;
        }

        var i2t = Math.Pow(pointMultiple / testMultiple, 2);
        return Math.Max(i2t, ColdTime(testMultiple, u) / ColdTime(pointMultiple, u));
    }

    /// <summary>
    /// The factor (at most 1, or 0 when no limit remains) by which a no-trip limit stated at <paramref name="pointMultiple"/>
    /// may shorten for a test at the higher <paramref name="testMultiple"/>.
    /// </summary>
    public static double Shrink(double testMultiple, double pointMultiple, double? highestUltimate)
    {
        if (testMultiple <= pointMultiple)
        {
            return 1.0;
        }

        if (highestUltimate is not { } u || pointMultiple <= u * (1 + 1e-9))
        {
            return 0.0;
        }

        var i2t = Math.Pow(pointMultiple / testMultiple, 2);
        return Math.Min(i2t, ColdTime(testMultiple, u) / ColdTime(pointMultiple, u));
    }

    // The first-order model's time from cold in units of τ: ln(M² / (M² − Mc²)) = −ln(1 − (Mc / M)²).
    private static double ColdTime(double multiple, double ultimate)
    {
        var y = ultimate / multiple;
        return -Math.Log(1 - (y * y));
    }
}
