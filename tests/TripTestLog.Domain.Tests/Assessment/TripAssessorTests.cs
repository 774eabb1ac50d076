using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Assessment;

/// <summary>Settings history, settings found at the test, and ambient handling, together.</summary>
public sealed class TripAssessorTests
{
    private static readonly AssetTag Tag = AssetTag.Of("E-1");

    private static Device Electronic(double ir, DateOnly? from) => new(
        Tag, "S", "L", DeviceFamily.Iec60947Electronic, Amperes.Of(630), 3, Volts.Of(400), null, null, "", "", "",
        new ElectronicTripSettings(Amperes.Of(ir), Seconds.Of(10), 6, null, null, false, null, LabPolicy.ElectronicTimeTolerance, LabPolicy.InstantaneousMax))
    { SettingsFrom = from };

    private static TripMeasurement Trip(DateOnly on, double amps, double seconds, double? ambient = null, SettingsFound? found = null) =>
        new(Tag, TestedAt.OnDate(on), TestStage.AsFound, Pole.All, Amperes.Of(amps), TripOutcome.TrippedAfter(Seconds.Of(seconds)),
            StartCondition.Cold, ambient is { } a ? Celsius.Of(a) : null, "", "", "") { FoundSettings = found };

    private static TripAssessor Assessor(IReadOnlyDictionary<string, AmbientTable>? ambient = null) =>
        new(new Dictionary<string, CurveTable>(), ambient ?? new Dictionary<string, AmbientTable>());

    private static readonly DeviceHistory History = new([Electronic(400, null), Electronic(500, new DateOnly(2023, 2, 1))]);

    [Fact]
    public void EachTest_IsJudgedWithTheSettingsInForceOnItsDate()
    {
        // 1200 A: 3 x 400 A (tr band 40 s ±20 %) before February 2023, 2.4 x 500 A (62.5 s ±20 %) after.
        var before = Assessor().Assess(History, Trip(new DateOnly(2022, 3, 1), 1200, 40));
        var after = Assessor().Assess(History, Trip(new DateOnly(2024, 3, 1), 1200, 40));

        Assert.Equal(Verdict.Pass, before.Assessment.Verdict);
        Assert.Equal(Verdict.TooEarly, after.Assessment.Verdict);
        Assert.Equal(400, before.Envelope.Reference.Value);
    }

    [Fact]
    public void SettingsFoundAtTheTest_WinOverTheRegister_AndSaySo()
    {
        // 1500 A with Ir 420 A found: 3.571 Ir, 28.2 s nominal; with the register's 500 A it would be 3 Ir, 40 s.
        var found = new SettingsFound(Amperes.Of(420), null, null, null, null, null);

        var result = Assessor().Assess(History, Trip(new DateOnly(2025, 3, 1), 1500, 28.2, found: found));

        Assert.Equal(Verdict.Pass, result.Assessment.Verdict);
        Assert.Contains(result.Assessment.Notes, n => n.Contains("Ir 420 A found", StringComparison.Ordinal) && n.Contains("500 A", StringComparison.Ordinal));
    }

    private static TripMeasurement MiniatureTrip(double amps, double seconds, double ambient) =>
        new(AssetTag.Of("M-1"), TestedAt.OnDate(new DateOnly(2024, 3, 1)), TestStage.AsFound, Pole.All, Amperes.Of(amps),
            TripOutcome.TrippedAfter(Seconds.Of(seconds)), StartCondition.Cold, Celsius.Of(ambient), "", "", "");

    private static readonly DeviceHistory Miniature = new([new Device(AssetTag.Of("M-1"), "S", "L", DeviceFamily.Iec60898, Amperes.Of(16), 1,
        Volts.Of(230), null, null, "", "", "", new Iec60898Settings(TripCurve.C))]);

    [Fact]
    public void AFailureTheAmbientCouldExplain_IsNotAssessable()
    {
        // C16 at 1.12 In tripping after 3000 s: too early against row a carried down (IEC 60898-1 Table 7). At 45 °C, 15 K
        // above the 30 °C reference, a thermal release may act at up to 15 % less current (1 %/K, from memory): row a
        // moves to 0.96 In and the trip would pass. At 20 °C the shift goes the other way and the failure stands.
        var hot = Assessor().Assess(Miniature, MiniatureTrip(17.92, 3000, ambient: 45));
        var cool = Assessor().Assess(Miniature, MiniatureTrip(17.92, 3000, ambient: 20));
        var near = Assessor().Assess(Miniature, MiniatureTrip(17.92, 3000, ambient: 34));

        Assert.Equal(Verdict.NotAssessable, hot.Assessment.Verdict);
        Assert.Contains("15 K above", hot.Assessment.Reason);
        Assert.Equal(Verdict.TooEarly, cool.Assessment.Verdict);
        Assert.Equal(Verdict.TooEarly, near.Assessment.Verdict);
    }

    [Fact]
    public void AnElectronicUnit_IsNotShiftedByTheAmbient()
    {
        // An electronic unit computes its time from the measured current; 20 °C against its 40 °C reference changes nothing.
        var result = Assessor().Assess(History, Trip(new DateOnly(2024, 3, 1), 1500, 31, ambient: 20));

        Assert.Equal(Verdict.TooEarly, result.Assessment.Verdict);
        Assert.Empty(result.Assessment.Notes);
    }

    [Fact]
    public void AnAmbientTable_ScalesTheThermalLimits_AndSaysSo()
    {
        var table = AmbientTable.Create("AMB", [new(Celsius.Of(20), 1.10), new(Celsius.Of(40), 1.00)]);
        var history = new DeviceHistory([Electronic(500, null) with { AmbientTable = "AMB" }]);

        var result = Assessor(new Dictionary<string, AmbientTable> { ["AMB"] = table }).Assess(history, Trip(new DateOnly(2024, 3, 1), 1500, 40, ambient: 20));

        // At 20 °C the release acts as at 40 °C with Ir x 1.10 = 550 A: 1500 A is 2.727 x, 48.4 s nominal.
        Assert.Equal(48.4 * 0.8, result.Assessment.Band.Minimum.Limit!.Value.Value, 1);
        Assert.Contains(result.Assessment.Notes, n => n.Contains("x1.1", StringComparison.Ordinal));
    }

    [Fact]
    public void AMissingCurveTable_MakesTheTestNotAssessable_WithTheReason()
    {
        var device = new Device(Tag, "S", "L", DeviceFamily.CurveTable, Amperes.Of(32), 1, Volts.Of(230), null, null, "", "", "", new CurveTableSettings("NOPE"));

        var result = Assessor().Assess(new DeviceHistory([device]), Trip(new DateOnly(2024, 1, 1), 64, 30));

        Assert.Equal(Verdict.NotAssessable, result.Assessment.Verdict);
        Assert.Contains("NOPE", result.Assessment.Reason);
    }

    [Fact]
    public void History_PicksTheEntryInForceOnADate()
    {
        Assert.Equal(400, ((ElectronicTripSettings)History.InForceOn(new DateOnly(2023, 1, 31)).Settings).Ir.Value);
        Assert.Equal(500, ((ElectronicTripSettings)History.InForceOn(new DateOnly(2023, 2, 1)).Settings).Ir.Value);
        Assert.Equal(500, ((ElectronicTripSettings)History.Latest.Settings).Ir.Value);
    }
}
