using CsCheck;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// For every family, over random settings and currents: edges never rise with current and the minimum never passes
/// the maximum, wherever the envelope sets a band. A minimum of "never" counts as infinitely late, an absent maximum
/// as unbounded.
/// </summary>
public sealed class AllFamiliesPropertyTests
{
    private static readonly Gen<ITripEnvelope> Electronic =
        Gen.Select(Gen.Double[10, 2000], Gen.Double[0.5, 30], Gen.Double[2, 10], Gen.Double[0.05, 0.5], Gen.Bool, Gen.Double[1.5, 3])
            .Select(t => (ITripEnvelope)new ElectronicTripEnvelope(Amperes.Of(t.Item1 * 1.2), new ElectronicTripSettings(
                Amperes.Of(t.Item1), Seconds.Of(t.Item2), 6, Amperes.Of(t.Item1 * t.Item3), Seconds.Of(t.Item4), t.Item5,
                Amperes.Of(t.Item1 * t.Item3 * t.Item6), LabPolicy.ElectronicTimeTolerance, LabPolicy.InstantaneousMax) { ThermalMemory = t.Item5 }));

    private static readonly Gen<ITripEnvelope> ThermalMagnetic =
        Gen.Select(Gen.Double[10, 1000], Gen.Double[3, 15])
            .Select(t => (ITripEnvelope)new ThermalMagneticEnvelope(Amperes.Of(t.Item1), new ThermalMagneticSettings(
                Amperes.Of(t.Item1), Amperes.Of(t.Item1 * t.Item2), LabPolicy.InstantaneousMax)));

    private static readonly Gen<ITripEnvelope> Relay =
        Gen.Select(Gen.Int[0, 6], Gen.Double[10, 2000], Gen.Double[0.05, 1.2], Gen.Double[5, 30], Gen.Bool)
            .Select(t => (ITripEnvelope)new RelayEnvelope(new RelaySettings(
                (IdmtCurve)t.Item1, Amperes.Of(t.Item2), t.Item3, t.Item5 ? Amperes.Of(t.Item2 * t.Item4) : null,
                t.Item5 ? Seconds.Of(0.05) : null, LabPolicy.RelayTimeTolerance, LabPolicy.RelayPickupTolerance, Seconds.Of(0.05))));

    private static readonly Gen<ITripEnvelope> Miniature =
        Gen.Select(Gen.Int[0, 2], Gen.Double[0.5, 125], Gen.Double[0.5, 1.5], Gen.Int[1, 4], Gen.Int[0, 2])
            .Select(t => (ITripEnvelope)new Iec60898Envelope((Devices.TripCurve)t.Item1, Amperes.Of(t.Item2), t.Item3, t.Item4,
                t.Item5 == 1 && t.Item1 < 2 ? Supply.Dc : Supply.Ac, rcbo: t.Item5 == 2));

    private static readonly Gen<ITripEnvelope> Tabled =
        Gen.Select(Gen.Double[10, 400], Gen.Double[6, 15], Gen.Double[1.2, 3])
            .Select(t => (ITripEnvelope)new OverlayEnvelope(
                new CurveTableEnvelope(CurveTable.Create("P", [
                    new(CurrentMultiple.Of(t.Item3), Seconds.Of(20), Seconds.Of(900)),
                    new(CurrentMultiple.Of(t.Item3 * 2), Seconds.Of(2), Seconds.Of(60)),
                    new(CurrentMultiple.Of(t.Item3 * 2 + t.Item2), Seconds.Of(0), Seconds.Of(0.05))]), Amperes.Of(t.Item1)),
                new ThermalMagneticEnvelope(Amperes.Of(t.Item1), new ThermalMagneticSettings(Amperes.Of(t.Item1), Amperes.Of(t.Item1 * t.Item2), LabPolicy.InstantaneousMax))));

    /// <summary>A random envelope of any family, with its settings, poles, supply and overlays.</summary>
    internal static readonly Gen<ITripEnvelope> Any = Gen.OneOf(Electronic, ThermalMagnetic, Relay, Miniature, Tabled);

    /// <summary>Random test conditions: either start, all poles or one.</summary>
    internal static readonly Gen<TestConditions> Conditions =
        Gen.Select(Gen.Bool, Gen.Bool).Select(t => new TestConditions(t.Item1 ? StartCondition.Warm : StartCondition.Cold, t.Item2 ? PoleLoading.OnePole : PoleLoading.AllPoles));

    [Fact]
    public void EdgesNeverRise_AndTheMinimumNeverPassesTheMaximum()
    {
        Gen.Select(Any, Gen.Double[0.5, 60], Gen.Double[0.5, 60], Conditions).Sample(t =>
        {
            var (envelope, x, y, conditions) = t;
            var (lo, hi) = x <= y ? (x, y) : (y, x);
            var low = envelope.At(CurrentMultiple.Of(lo) * envelope.Reference).For(conditions);
            var high = envelope.At(CurrentMultiple.Of(hi) * envelope.Reference).For(conditions);
            foreach (var band in new[] { low, high }.Where(b => b.HasRequirement))
            {
                Assert.True(Earliest(band) <= Latest(band), $"{envelope.Standard}: min above max at {band.Multiple}");
            }

            if (low.HasRequirement && high.HasRequirement)
            {
                Assert.True(Earliest(high) <= Earliest(low), $"{envelope.Standard}: minimum rose from {lo} to {hi}");
                Assert.True(Latest(high) <= Latest(low), $"{envelope.Standard}: maximum rose from {lo} to {hi}");
            }
        }, iter: 20_000);
    }

    private static double Earliest(AppliedBand band) => band.Minimum.Limit?.Value ?? double.PositiveInfinity;

    private static double Latest(AppliedBand band) => band.Maximum.Limit?.Value ?? double.PositiveInfinity;
}
