using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Wording.Tests;

/// <summary>The words made at the edge from what a rule found: the same sentences every writer of findings shows.</summary>
public sealed class FindingWordsTests
{
    private static readonly AssetTag Tag = AssetTag.Of("W-01");
    private static readonly TestedAt At = TestedAt.Parse("2026-03-01T09:00");

    [Fact]
    public void ThePoleSpreadBasis_StatesALabThresholdOf35Percent_BesideTheCustomaryGuide()
    {
        // ANSI/NETA maintenance testing specifications: the customary guide is 50 % (from memory); the lab's policy says 35.
        var spread = Spread(new ContactFacts.PoleSpread(TestStage.AsFound, "3", 40, 140, 100, 35, SpreadBasis.LabPolicy));

        Assert.Equal("lab policy: investigate a pole more than 35 % above the lowest (the ANSI/NETA maintenance testing specifications' "
            + "customary guide is 50 %; not a failure)", spread.Basis);
        Assert.Equal("pole 3 reads 40% above the device's lowest pole (140 against 100 µΩ at 20 °C); investigate the connections and contacts "
            + "of that pole (pole resistance alone does not predict performance)", spread.Message);
    }

    [Theory]
    [InlineData(50, "more than 50 % above the lowest")]
    [InlineData(45, "more than 45 % above the lowest")]
    [InlineData(37.5, "more than 37.5 % above the lowest")]
    public void ThePoleSpreadBasis_UnderTheCustomaryGuide_StatesTheThresholdTheFindingCarries(double threshold, string phrase)
    {
        var spread = Spread(new ContactFacts.PoleSpread(TestStage.AsFound, "2", 60, 160, 100, threshold, SpreadBasis.CustomaryGuide));

        Assert.Equal($"ANSI/NETA maintenance testing specifications: investigate a pole {phrase} (a customary guide, not a failure)", spread.Basis);
    }

    [Fact]
    public void AnAsLeftSpread_IsSaidToBeAsLeft()
    {
        var spread = Spread(new ContactFacts.PoleSpread(TestStage.AsLeft, "2", 60, 160, 100, 50, SpreadBasis.CustomaryGuide));

        Assert.StartsWith("as-left: pole 2 reads 60% above", spread.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ARepairedFinding_KeepsWhatWasFound_AndSaysWhatStands()
    {
        var over = new Finding(FindingKind.ContactOverLimit, Severity.Investigate, Tag, At,
            new ContactFacts.OverLimit(TestStage.AsFound, "1", new ContactFacts.PoleReading(262.4, 250, true), 200), [])
        {
            Pole = "1",
            Repaired = new Settlement(false, new DateOnly(2026, 3, 1), new Settler.PoleWithinLimit("1", 150.4)),
            Settled = new Settlement(false, new DateOnly(2026, 3, 2), new Settler.PoleWithinLimit("1", 149.6)),
        };

        Assert.Equal("found on 2026-03-01: pole 1 reads 262 µΩ at 20 °C (250 µΩ as measured), over the limit of 200 µΩ; repaired: the as-left "
            + "reading of pole 1 within the limit (150 µΩ) on 2026-03-01 is good; confirm it at the next as-found test", over.Message);
        Assert.Equal("as-left reading of pole 1 within the limit (150 µΩ) on 2026-03-02 confirms the repair; the next as-found test closes it", over.Standing);
        Assert.Equal("pole 1", over.Concerns);
        Assert.Equal("the maker's contact resistance limit (register contact_limit_uohm)", over.Basis);
    }

    [Theory]
    [MemberData(nameof(Settlers))]
    public void AClosedFinding_NamesTheTestThatClosedIt(Settler by, string words)
    {
        var closed = new Finding(FindingKind.RetestNeeded, Severity.Investigate, Tag, At, "basis", "message", [])
        {
            Open = false,
            Settled = new Settlement(true, new DateOnly(2026, 4, 1), by),
        };

        Assert.Equal($"closed by the as-found {words} on 2026-04-01", closed.Standing);
    }

    public static TheoryData<Settler, string> Settlers() => new()
    {
        { new Settler.TripVerdict(Verdict.Pass, "2.55 In cold"), "pass at 2.55 In cold" },
        { new Settler.TripVerdict(Verdict.TooEarly, "5 In cold", ClearOfUncertainty: true), "too early at 5 In cold clear of the measurement uncertainty" },
        { new Settler.RegisterSettings(), "test that read the register's settings" },
        { new Settler.TraceableInstrument(TestKind.Insulation), "insulation test with a traceable instrument" },
        { new Settler.PathAtVoltage("1-E", 500), "test of path 1-E at 500 V DC" },
        { new Settler.ReadingClearOfUncertainty(), "a reading clear of the measurement uncertainty of its limit" },
    };

    [Fact]
    public void GivenWords_AreShownAsGiven_AndAFindingWithNoSubjectConcernsTheWholeDevice()
    {
        var given = new Finding(FindingKind.SettingsDiffer, Severity.Investigate, Tag, At, "a basis", "a message", []);

        Assert.Equal(("a basis", "a message", null, ""), (given.Basis, given.Message, given.Standing, given.Concerns));
    }

    [Fact]
    public void AnInsulationFall_UnderNoCorrection_IsComparedAsMeasured_AndCountsItsUntraceableReadings()
    {
        var falling = new Finding(FindingKind.InsulationFalling, Severity.Plan, Tag, At,
            new InsulationFacts.Falling("1-E", 4, InsulationCorrectionRule.None, 50, 4000, new DateOnly(2021, 3, 1), 500, 25, new DateOnly(2028, 6, 1),
                new DateOnly(2026, 12, 1), new UntraceableShare(1, 4, UntraceableReadings.Mark)), []);

        Assert.Equal("Theil–Sen trend (Sen 1968) of 4 as-found readings compared as measured (insulation_correction = none)", falling.Basis);
        Assert.Equal("path 1-E falls about 50% a year (4000 to 500 MΩ as measured since 2021-03-01) and would reach the minimum of 25 MΩ about "
            + "2028-06-01; look for moisture, contamination or tracking; 1 of its 4 readings comes from an instrument not traceable on the day "
            + "(marked on the chart; untraceable_readings = mark)", falling.Message);
    }

    [Fact]
    public void ASessionsUntracedInstrument_NamesTheTestsAndTheRegistersReason()
    {
        var lapsed = new Finding(FindingKind.CalibrationLapsed, Severity.Investigate, Tag, At,
            new InstrumentFacts.SessionUntraced(TestKind.Contact, new DateOnly(2026, 3, 1), new UntracedInstrument(true, "instrument M-1 calibration lapsed on 2025-12-31")), []);

        Assert.Equal("lab policy: every measurement is made with an instrument in calibration", lapsed.Basis);
        Assert.Equal("contact resistance tests on 2026-03-01: instrument M-1 calibration lapsed on 2025-12-31; confirm the instrument's accuracy or repeat the tests",
            lapsed.Message);
    }

    private static Finding Spread(ContactFacts.PoleSpread facts) =>
        new(FindingKind.ContactPoleSpread, Severity.Investigate, Tag, At, facts, []) { Pole = facts.Pole };
}
