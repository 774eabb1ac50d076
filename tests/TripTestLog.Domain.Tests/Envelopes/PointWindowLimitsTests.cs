using CsCheck;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// The band read for its limits alone (the judge's reads either side of a test's current, for a limit's slope) against
/// the band read in full, for every family, near every standard point, at any ambient. The tool's own invariant: no
/// outside source.
/// </summary>
public sealed class PointWindowLimitsTests
{
    [Fact]
    public void TheLimitsRead_MatchTheFullBand_EdgeForEdge_AndNameTheSameRequirement()
    {
        var near = Gen.Select(AllFamiliesPropertyTests.Any, Gen.Int[0, 20], Gen.Double[-0.06, 0.06], Gen.Double[-25, 25]);
        near.Sample(t =>
        {
            var (inner, which, offset, kelvin) = t;
            var ambient = kelvin == 0 ? AmbientShift.None : AmbientShift.For(kelvin, 0.005, "ambient", "20 °C");
            var envelope = PointWindowEnvelope.Of(inner, 0.03, ambient);
            var multiple = envelope.Points.Count == 0 ? 1.3 + offset : envelope.Points[which % envelope.Points.Count].Multiple.Value * (1 + offset);
            var current = Amperes.Of(envelope.Reference.Value * multiple);

            var full = envelope.At(current);
            var limits = envelope.LimitsAt(current);

            Assert.Equal(full.NoRequirement, limits.NoRequirement);
            Same(full.Minimums, limits.Minimums);
            Same(full.Maximums, limits.Maximums);
        }, iter: 4000);
    }

    [Fact]
    public void AnOffsetPointsLimit_IsWordedInFull_OnlyInTheFullBand()
    {
        // IEC 60898-1 Table 7 row c (2.55 In, 1 s < t < 60 s): a test 2 % below it is a test of it, with its limits moved
        // for the offset (the tool's window rule, docs/judging.md).
        var envelope = PointWindowEnvelope.Of(new Iec60898Envelope(Devices.TripCurve.C, Amperes.Of(16)), 0.03);
        var current = Amperes.Of(16 * 2.55 * 0.98);

        var full = envelope.At(current).Maximums.Single(e => e.PointLabel == "c" && !e.Carried && e.Requirement.Contains(';', StringComparison.Ordinal));
        var limit = envelope.LimitsAt(current).Maximums.Single(e => e.PointLabel == "c" && !e.Carried && e.Limit == full.Limit);

        Assert.Contains("tested 2.0 % below its current", full.Requirement, StringComparison.Ordinal);
        Assert.Equal(full.Requirement[..full.Requirement.IndexOf(';', StringComparison.Ordinal)], limit.Requirement);
    }

    private static void Same(IReadOnlyList<BandEdge> full, IReadOnlyList<BandEdge> limits)
    {
        Assert.Equal(full.Count, limits.Count);
        for (var i = 0; i < full.Count; i++)
        {
            var (a, b) = (full[i], limits[i]);
            Assert.Equal(a.Limit, b.Limit);
            Assert.Equal((a.Source, a.Strength, a.Strict, a.AnyStart, a.Start, a.Loading, a.PointLabel, a.Carried, a.Anchor, a.ProvenByHolding),
                (b.Source, b.Strength, b.Strict, b.AnyStart, b.Start, b.Loading, b.PointLabel, b.Carried, b.Anchor, b.ProvenByHolding));
            Assert.Equal(Before(a.Requirement), Before(b.Requirement));
        }
    }

    private static string Before(string requirement) =>
        requirement.IndexOf(';', StringComparison.Ordinal) is var i and >= 0 ? requirement[..i] : requirement;
}
