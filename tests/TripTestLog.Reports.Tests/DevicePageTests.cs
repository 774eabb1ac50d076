using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Reports.Html;

namespace TripTestLog.Reports.Tests;

/// <summary>
/// A device page as written for one invented C16: the cautions and sign-off every page carries, the insulation table
/// with the reading as measured beside the value by the lab's rule, and the mark for an untraceable instrument.
/// </summary>
public sealed class DevicePageTests
{
    private static readonly DateOnly AsOf = new(2026, 12, 1);

    // OHM-1 in calibration throughout; OHM-2's calibration ran out on 2024-12-31.
    private static readonly InstrumentRegister Instruments = new(
    [
        new InstrumentCalibration("OHM-1", "micro-ohm meter", "M-1", new DateOnly(2023, 1, 1), new DateOnly(2027, 1, 1)),
        new InstrumentCalibration("OHM-2", "micro-ohm meter", "M-2", new DateOnly(2023, 1, 1), new DateOnly(2024, 12, 31)),
    ]);

    private static StoredMeasurement<ContactMeasurement> Contact(int year, double microOhms, string instrument) =>
        new(new ContactMeasurement(Charts.C16.Latest.Tag, TestedAt.At(new DateTime(year, 3, 1, 10, 0, 0)), TestStage.AsFound, Pole.Parse("1"),
            MicroOhms.Of(microOhms), Amperes.Of(10), Celsius.Of(20), instrument, "A. Tester"), "contacts.csv", year - 2020);

    private static StoredMeasurement<InsulationMeasurement> Insulation(string path, double megaOhms, double? celsius) =>
        new(new InsulationMeasurement(Charts.C16.Latest.Tag, TestedAt.At(new DateTime(2026, 3, 1, 11, 0, 0)), TestStage.AsFound, path, Volts.Of(500),
            new InsulationReading(MegaOhms.Of(megaOhms), false), celsius is { } c ? Celsius.Of(c) : null, Seconds.Of(60)) { Instrument = "" }, "insulation.csv", 2);

    internal static string Page(FindingPolicy policy)
    {
        var trip = Charts.Trip(40.9, 22.5, year: 2026);
        var records = new DeviceRecords(Charts.C16, [trip.Trip])
        {
            Contacts = [Contact(2024, 5000, "OHM-1"), Contact(2025, 5500, "OHM-2"), Contact(2026, 6000, "OHM-1")],
            Insulation = [Insulation("1-E", 9, 40), Insulation("1-N", 30, null)],
        };
        var condition = new DeviceCondition(Charts.C16.Latest, ConditionGrade.Sound, new DateOnly(2026, 3, 1), new DateOnly(2029, 3, 1), []);
        var context = new ReportContext("lab.db", "test", AsOf, new DateTimeOffset(2026, 12, 1, 9, 0, 0, TimeSpan.Zero), policy, "test policy", Instruments);
        return DevicePage.Write(new DeviceReport(records, [trip], condition), context);
    }

    private static string Row(string page, string path)
    {
        var row = page[page.IndexOf($"<td>{path}</td>", StringComparison.Ordinal)..];
        return row[..row.IndexOf("</tr>", StringComparison.Ordinal)];
    }

    [Fact]
    public void EveryDevicePage_CarriesTheCaution_TheSignOff_AndWhereItCameFrom()
    {
        var page = Page(FindingPolicy.Default);

        Assert.Contains("Caution:", page, StringComparison.Ordinal);
        Assert.Contains("manufacturer", page, StringComparison.Ordinal);
        Assert.Contains("<h2>Sign-off</h2>", page, StringComparison.Ordinal);
        Assert.Contains("database lab.db; findings as of 2026-12-01; policy: test policy", page, StringComparison.Ordinal);
    }

    [Theory]
    // 9 MOhm read at 40 °C: x 2^2 = 36 MOhm at 20 °C by halving per 10 K (common practice); x 10^0.4 = 22.6 MOhm by the
    // solid-insulation columns' rule (from memory: x 2.50 at 40 °C); as measured under none.
    [InlineData(InsulationCorrectionRule.HalvingPer10K, "36 MΩ", "insulation_correction = halving-10k")]
    [InlineData(InsulationCorrectionRule.SolidInsulation, "22.6 MΩ", "insulation_correction = solid-insulation")]
    [InlineData(InsulationCorrectionRule.None, "9 MΩ", "insulation_correction = none")]
    public void TheInsulationTable_PutsTheReadingAsMeasuredBesideTheValueByTheNamedRule(InsulationCorrectionRule rule, string at20, string named)
    {
        var page = Page(FindingPolicy.Default with { InsulationCorrection = rule });

        Assert.EndsWith("<td>9 MΩ</td><td>40 &#176;C</td><td>" + at20 + "</td>", Row(page, "1-E"), StringComparison.Ordinal);
        Assert.Contains(named + ":", page, StringComparison.Ordinal);
        Assert.Contains(rule == InsulationCorrectionRule.None ? "<th>compared (not corrected)</th>" : "<th>at 20 &#176;C</th>", page, StringComparison.Ordinal);

        // A reading with no temperature is not corrected, whatever the rule, and the row says so.
        Assert.EndsWith("<td>30 MΩ</td><td>not recorded</td><td>(not corrected)</td>", Row(page, "1-N"), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(UntraceableReadings.Mark, "counted in the trend lines (untraceable_readings = mark)")]
    [InlineData(UntraceableReadings.Exclude, "left out of the trend lines (untraceable_readings = exclude)")]
    public void AContactReadingFromALapsedMeter_IsRingedOnTheChart_AndTheCaptionSaysWhatTheTrendsDidWithIt(UntraceableReadings policy, string caption)
    {
        var page = Page(FindingPolicy.Default with { UntraceableReadings = policy });

        var contact = page[page.IndexOf("<h2>Contact resistance</h2>", StringComparison.Ordinal)..page.IndexOf("<h2>Insulation resistance</h2>", StringComparison.Ordinal)];
        Assert.Contains("instrument not traceable", Charts.SvgText(contact));
        Assert.Contains(caption, contact, StringComparison.Ordinal);
    }

    [Fact]
    public void APageWhoseReadingsAreAllTraceable_HasNoRingAndNoCaptionForOne()
    {
        var trip = Charts.Trip(40.9, 22.5, year: 2026);
        var records = new DeviceRecords(Charts.C16, [trip.Trip]) { Contacts = [Contact(2024, 5000, "OHM-1"), Contact(2026, 6000, "OHM-1")] };
        var condition = new DeviceCondition(Charts.C16.Latest, ConditionGrade.Sound, new DateOnly(2026, 3, 1), new DateOnly(2029, 3, 1), []);
        var context = new ReportContext("lab.db", "test", AsOf, DateTimeOffset.UnixEpoch, FindingPolicy.Default, "test policy", Instruments);

        var page = DevicePage.Write(new DeviceReport(records, [trip], condition), context);

        Assert.DoesNotContain("instrument not traceable", page, StringComparison.Ordinal);
        Assert.DoesNotContain("Diamond ring", page, StringComparison.Ordinal);
    }
}
