using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Planning;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Planning;

/// <summary>The trip points a worksheet plans, against the standards' own points.</summary>
public sealed class TripTestPlanTests
{
    private static Device Breaker(DeviceFamily family, double rated, int poles, DeviceSettings settings) =>
        new(AssetTag.Of("T-1"), "Site", "Board", family, Amperes.Of(rated), poles, Volts.Of(400), null, null, "", "", "", settings);

    [Fact]
    public void AMiniatureBreaker_GetsTable7RowsAtoE_InOrder_WithRowBStraightAfterRowA()
    {
        // IEC 60898-1 Table 7 rows a to e for a C16: 1.13, 1.45 and 2.55 In; curve C's instantaneous range is above 5 In up
        // to 10 In (Table 2), so d at 80 A and e at 160 A.
        var device = Breaker(DeviceFamily.Iec60898, 16, 1, new Iec60898Settings(TripCurve.C));

        var plan = TripTestPlan.For(device, EnvelopeFactory.For(device));

        Assert.Equal(["a", "b", "c", "d", "e"], plan.Select(p => p.Label));
        Assert.Equal([18.08, 23.2, 40.8, 80, 160], plan.Select(p => Math.Round(p.Current.Value, 9)));
        Assert.Equal([StartCondition.Cold, StartCondition.Warm, StartCondition.Cold, StartCondition.Cold, StartCondition.Cold],
            plan.Select(p => p.Conditions.Start));
        Assert.True(plan[1].StraightAfterPrevious);
        Assert.False(plan[2].StraightAfterPrevious);
    }

    [Fact]
    public void TheWindows_AreTable7Limits_ForAnInOf16A()
    {
        // Table 7: a no trip within 1 h (In <= 63 A); b trip within 1 h; c 1 s < t < 60 s (In <= 32 A); d no trip at
        // t <= 0.1 s; e trip at t < 0.1 s.
        var device = Breaker(DeviceFamily.Iec60898, 16, 1, new Iec60898Settings(TripCurve.C));

        var plan = TripTestPlan.For(device, EnvelopeFactory.For(device));

        Assert.Equal(3600, plan[0].HoldFor!.Value.Value);
        Assert.Equal("no trip within 1 h", plan[0].Acceptance);
        Assert.Null(plan[1].HoldFor);
        Assert.Equal("trip before 1 h", plan[1].Acceptance);
        Assert.Equal("trip after 1 s and before 60 s", plan[2].Acceptance);
        Assert.Equal("no trip within 100 ms", plan[3].Acceptance);
        Assert.Equal("trip before 100 ms", plan[4].Acceptance);
        Assert.Equal(60, plan[2].Window.Maximum.Limit!.Value.Value);
        Assert.Contains("IEC 60898-1 Table 7 c", plan[2].Basis, StringComparison.Ordinal);
    }

    [Fact]
    public void AThreePoleBreakerAbove63A_HasTheSinglePolePoint_AndTwoHourConventionalTime()
    {
        // Table 7: the conventional time is 2 h for In > 63 A. The single-pole point of a three-pole breaker is
        // 1.2 x 1.45 In (IEC 60898-1 9.10.3, from memory of the clause), one pole loaded, trip within the conventional time.
        var device = Breaker(DeviceFamily.Iec60898, 80, 3, new Iec60898Settings(TripCurve.B));

        var plan = TripTestPlan.For(device, EnvelopeFactory.For(device));

        var single = Assert.Single(plan, p => p.Label == "1-pole");
        Assert.Equal(1.2 * 1.45 * 80, single.Current.Value, 9);
        Assert.Equal(PoleLoading.OnePole, single.Conditions.Loading);
        Assert.Equal("1", single.Pole.Code);
        // The lower edge is the I²t that row c's "1 s < t" implies at a lower current: 1 s x (2.55 / 1.74)² = 2.15 s.
        Assert.Equal("trip after 2.15 s and by 2 h", single.Acceptance);
        Assert.Equal("no trip within 2 h", plan.Single(p => p.Label == "a").Acceptance);
    }

    [Fact]
    public void AnElectronicUnit_GetsTheConventionalPoints_ALongTimePoint_AndBothSidesOfEachPickup()
    {
        // IEC 60947-2 8.3.3 (from memory): 1.05 and 1.30 Ir; the short-time and instantaneous releases do not operate at
        // 80 % of their setting and do at 120 %.
        var settings = new ElectronicTripSettings(Amperes.Of(500), Seconds.Of(10), 6, Amperes.Of(2400), Seconds.Of(0.2), false, Amperes.Of(6000),
            LabPolicy.ElectronicTimeTolerance, LabPolicy.InstantaneousMax);
        var device = Breaker(DeviceFamily.Iec60947Electronic, 630, 3, settings);

        var plan = TripTestPlan.For(device, EnvelopeFactory.For(device));

        Assert.Equal(["1.05Ir", "1.30Ir", "2 Ir", "0.8 Isd", "1.2 Isd", "0.8 Ii", "1.2 Ii"], plan.Select(p => p.Label));
        Assert.Equal([525, 650, 1000, 1920, 2880, 4800, 7200], plan.Select(p => Math.Round(p.Current.Value, 6)));

        // 6 Ir (3000 A) would reach the short-time release's band (above 0.8 x 2400 A), so the long-time point moves down.
        Assert.Contains("common practice", plan[2].Basis, StringComparison.Ordinal);
        Assert.True(plan[1].StraightAfterPrevious);
    }

    [Fact]
    public void ARelay_IsTimedAtTwoFiveAndTenTimesPickup_BelowTheHighSet_ThenAboveIt()
    {
        var settings = new RelaySettings(IdmtCurve.StandardInverse, Amperes.Of(800), 0.1, Amperes.Of(6000), Seconds.Of(0.05),
            LabPolicy.RelayTimeTolerance, 0.05, Seconds.Zero);
        var device = Breaker(DeviceFamily.RelayIdmt, 1000, 3, settings);

        var plan = TripTestPlan.For(device, EnvelopeFactory.For(device));

        // 10 x 800 A = 8000 A lies above 80 % of the 6000 A high-set, where the high-set may act, so it is left out.
        Assert.Equal(["2 x pickup", "5 x pickup", "1.2 x high-set"], plan.Select(p => p.Label));
        Assert.Equal([1600, 4000, 7200], plan.Select(p => p.Current.Value));

        // IEC 60255-151 standard inverse: t = TMS x 0.14 / ((I/Is)^0.02 - 1); at 2 x Is and TMS 0.1 that is 1.003 s, and the
        // window holds it.
        var expected = 0.1 * 0.14 / (Math.Pow(2, 0.02) - 1);
        Assert.True(plan[0].Window.Minimum.Limit!.Value.Value < expected && expected < plan[0].Window.Maximum.Limit!.Value.Value);
    }

    [Fact]
    public void ADeviceWhoseCurveTableIsMissing_GetsNoTripPoints()
    {
        var device = Breaker(DeviceFamily.CurveTable, 100, 3, new CurveTableSettings("missing"));

        var plan = TripTestPlan.For(device, EnvelopeFactory.For(device));

        Assert.Empty(plan);
    }

    public static TheoryData<string> PlannedDevices => new() { "c16", "b80x3", "electronic", "thermal-magnetic", "relay" };

    private static Device PlannedDevice(string name) => name switch
    {
        "c16" => Breaker(DeviceFamily.Iec60898, 16, 1, new Iec60898Settings(TripCurve.C)),
        "b80x3" => Breaker(DeviceFamily.Iec60898, 80, 3, new Iec60898Settings(TripCurve.B)),
        "electronic" => Breaker(DeviceFamily.Iec60947Electronic, 630, 3, new ElectronicTripSettings(Amperes.Of(500), Seconds.Of(10), 6,
            Amperes.Of(2400), Seconds.Of(0.2), false, Amperes.Of(6000), LabPolicy.ElectronicTimeTolerance, LabPolicy.InstantaneousMax)),
        "thermal-magnetic" => Breaker(DeviceFamily.Iec60947ThermalMagnetic, 160, 3, new ThermalMagneticSettings(Amperes.Of(125), Amperes.Of(1250), LabPolicy.InstantaneousMax)),
        _ => Breaker(DeviceFamily.RelayIdmt, 1000, 3, new RelaySettings(IdmtCurve.StandardInverse, Amperes.Of(800), 0.1, Amperes.Of(6000),
            Seconds.Of(0.05), LabPolicy.RelayTimeTolerance, 0.05, Seconds.Zero)),
    };

    [Theory]
    [MemberData(nameof(PlannedDevices))]
    public void EveryPlannedPoint_ProvesItsRequirement_WhenTheResultLandsInItsWindow(string name)
    {
        // The planned currents sit on the proving side of each point's window: a hold for the planned time, or a trip
        // in the middle of the window the worksheet prints, is a pass that names what it proved.
        var device = PlannedDevice(name);
        var envelope = EnvelopeFactory.For(device);

        foreach (var p in TripTestPlan.For(device, envelope))
        {
            if (p.HoldFor is null && p.Window.Maximum.Limit is null)
            {
                continue; // a trip the plan asks for without a time bound: nothing to land inside
            }

            var min = p.Window.Minimum.IsOpen || p.Window.Minimum.Limit is null ? 0.0 : p.Window.Minimum.Limit.Value.Value;
            var outcome = p.HoldFor is { } hold
                ? TripOutcome.HeldFor(hold)
                : TripOutcome.TrippedAfter(Seconds.Of(min > 0 ? Math.Sqrt(min * p.Window.Maximum.Limit!.Value.Value) : p.Window.Maximum.Limit!.Value.Value / 2));
            var m = new TripMeasurement(device.Tag, TestedAt.OnDate(new DateOnly(2025, 1, 1)), TestStage.AsFound, p.Pole, p.Current, outcome,
                p.Conditions.Start, null, "", "", "");

            var a = TripJudge.Assess(envelope, m, p.Conditions);

            Assert.True(a.Verdict == Verdict.Pass, $"{name} {p.Label}: {a.Verdict}: {a.Reason}");
            Assert.False(string.IsNullOrEmpty(a.Proved));
        }
    }
}
