using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;
using static TripTestLog.Domain.Tests.Verdicts.TripJudgeTests;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// Both sides of IEC 60898-1 Table 7 rows a, b and c (C16, In 16 A) at 0.5 %, 2 % and 4 % off the point, trips and holds,
/// just inside and just outside the moved limits. Moved limits worked by hand with the first-order thermal bound,
/// g(y) = -ln(1 - y²), Mc = 1.45 In: row c's 60 s at -0.5 % (40.596 A) is 60.741 s, at -2 % (39.984 A) 63.057 s; its
/// 1 s at +0.5 % (41.004 A) is 0.9879 s, at +2 % (41.616 A) 0.9529 s. The window is the lab's ±3 % (policy).
/// </summary>
public sealed class PointWindowTests
{
    [Theory]
    // Below row c: the trip-by limit stretches; past the stretched limit is too late, between 60 s and it is open.
    [InlineData(40.596, 60.70, Verdict.NotAssessable)]
    [InlineData(40.596, 60.80, Verdict.TooLate)]
    [InlineData(39.984, 63.00, Verdict.NotAssessable)]
    [InlineData(39.984, 63.10, Verdict.TooLate)]
    [InlineData(39.984, 59.90, Verdict.Pass)]
    // 4 % below (39.168 A) is outside the window: row c no longer applies, and row b assumes a warm start.
    [InlineData(39.168, 200, Verdict.NotAssessable)]
    // Above row c: the 1 s minimum shrinks; before the shrunk minimum is too early, between it and 1 s is open.
    [InlineData(41.004, 0.985, Verdict.TooEarly)]
    [InlineData(41.004, 0.990, Verdict.NotAssessable)]
    [InlineData(41.616, 0.950, Verdict.TooEarly)]
    [InlineData(41.616, 0.955, Verdict.NotAssessable)]
    [InlineData(41.616, 1.5, Verdict.Pass)]
    // 4 % above (42.432 A) is outside the window: only row d's 0.1 s minimum is left, and nothing proves a trip there.
    [InlineData(42.432, 0.5, Verdict.NotAssessable)]
    [InlineData(42.432, 0.05, Verdict.TooEarly)]
    public void RowC_AtOffsets_MovesOnlyInTheTestsFavour(double amps, double seconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, 16, amps, Tripped(seconds), StartCondition.Cold);

        Assert.Equal(expected, a.Verdict);
    }

    [Theory]
    // Row a (18.08 A, no trip within 1 h). Holds of the full hour within the window below prove it, and at or above it
    // a fortiori; 4 % below (17.357 A) proves nothing. A trip within the hour below the point is too early (row a is
    // carried down); just above it the limit may fall away (the ultimate current may sit between 1.13 and 1.45 In).
    [InlineData(17.990, true, 3600, Verdict.Pass)]        // -0.5 %
    [InlineData(17.718, true, 3600, Verdict.Pass)]        // -2 %
    [InlineData(17.357, true, 3600, Verdict.NotAssessable)] // -4 %
    [InlineData(18.170, true, 3600, Verdict.Pass)]        // +0.5 %
    [InlineData(17.990, true, 3599, Verdict.NotAssessable)]
    [InlineData(17.990, false, 3599, Verdict.TooEarly)]
    [InlineData(17.990, false, 3601, Verdict.Pass)]
    [InlineData(18.170, false, 1800, Verdict.NotAssessable)] // +0.5 %
    [InlineData(18.442, false, 1800, Verdict.NotAssessable)] // +2 %
    public void RowA_AtOffsets(double amps, bool held, double seconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(TripCurve.C, 16, amps, held ? Held(seconds) : Tripped(seconds), StartCondition.Cold).Verdict);
    }

    [Theory]
    // Row b (23.2 A, from warm, trip within 1 h) is the conventional tripping current: just below it a compliant release
    // may never trip, so a hold there is open; at or above it a 1 h hold is too late, and a trip within 1 h anywhere in
    // the window proves it.
    [InlineData(23.084, true, 3600, Verdict.NotAssessable)] // -0.5 %
    [InlineData(22.736, true, 3600, Verdict.NotAssessable)] // -2 %
    [InlineData(23.316, true, 3600, Verdict.TooLate)]       // +0.5 %
    [InlineData(23.664, true, 3600, Verdict.TooLate)]       // +2 %
    [InlineData(22.736, false, 3000, Verdict.Pass)]
    [InlineData(23.664, false, 3000, Verdict.Pass)]
    [InlineData(23.664, false, 3600, Verdict.TooLate)]
    public void RowB_AtOffsets(double amps, bool held, double seconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(TripCurve.C, 16, amps, held ? Held(seconds) : Tripped(seconds), StartCondition.Warm).Verdict);
    }
}
