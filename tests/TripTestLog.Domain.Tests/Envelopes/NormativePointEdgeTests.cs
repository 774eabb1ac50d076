using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// A standard point's edges, made once and shared. IEC 60898-1 Table 7 row c (2.55 In from cold: no trip within 1 s,
/// a trip within 60 s for In ≤ 32 A) is the point; what is checked is the tool's own sharing, no outside source.
/// </summary>
public sealed class NormativePointEdgeTests
{
    private static NormativePoint RowC() => new("c", CurrentMultiple.Of(2.55), StartCondition.Cold, Seconds.Of(1), Seconds.Of(60),
        "IEC 60898-1 Table 7 c: 2.55 In from cold, trip at 1 s < t < 60 s") { HoldStrict = true, TripStrict = true, HighestUltimate = 1.45 };

    [Fact]
    public void APointsEdges_SayItsLimits_AndAreTheSameEdgeEachTimeAskedFor()
    {
        var c = RowC();

        var hold = c.HoldEdge(carried: false);
        var tripCarried = c.TripEdge(carried: true);

        Assert.Equal((Seconds.Of(1), true, "c", false, EdgeSource.NormativePoint), (hold.Limit!.Value, hold.Strict, hold.PointLabel, hold.Carried, hold.Source));
        Assert.Equal("IEC 60898-1 Table 7 c: 2.55 In from cold, trip at 1 s < t < 60 s, carried to higher currents", tripCarried.Requirement);
        Assert.Equal(Seconds.Of(60), tripCarried.Limit);
        Assert.Same(hold, c.HoldEdge(carried: false));
        Assert.Same(tripCarried, c.TripEdge(carried: true));
        Assert.NotSame(c.TripEdge(carried: false), tripCarried);
    }

    [Fact]
    public void APointThatHasGivenItsEdges_StillEqualsOneThatHasNot()
    {
        var asked = RowC();
        _ = asked.HoldEdge(carried: true);
        _ = asked.TripEdge(carried: false);

        Assert.Equal(RowC(), asked);
        Assert.Equal(RowC().GetHashCode(), asked.GetHashCode());
        Assert.NotSame(asked.TripEdge(carried: false), RowC().TripEdge(carried: false));
        Assert.Equal(asked.TripEdge(carried: false), RowC().TripEdge(carried: false));
    }

    [Fact]
    public void APointMadeFromAnother_GivesItsOwnEdges()
    {
        var c = RowC();
        _ = c.TripEdge(carried: false);

        var later = c with { MustTripWithin = Seconds.Of(40), TripStrict = false };

        Assert.Equal(Seconds.Of(40), later.TripEdge(carried: false).Limit);
        Assert.False(later.TripEdge(carried: false).Strict);
        Assert.Equal(Seconds.Of(60), c.TripEdge(carried: false).Limit);
    }
}
