using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>Contact resistance judged per pole: limit, spread, rise, trend, test current, temperature and repeated readings.</summary>
public sealed class ContactFindingsTests
{
    private const string Instrument = ",OHM-1,A. Tester";

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void PoleSpread_FiresJustAbove50Percent_AndNotJustBelow(Provider provider)
    {
        // ANSI/NETA customary guide: investigate a pole more than 50 % above the lowest. At 20.0 C no correction applies.
        using var fleet = new FindingsStore(provider)
            .Register("S-49,Site,Way 1,iec60898,C,16,3,400,2019-01-01,10000,,,", "S-51,Site,Way 2,iec60898,C,16,3,400,2019-01-01,10000,,,")
            .Contacts(
                "S-49,2026-03-01,as-found,1,4000,10,20.0" + Instrument, "S-49,2026-03-01,as-found,2,5960,10,20.0" + Instrument, "S-49,2026-03-01,as-found,3,4000,10,20.0" + Instrument,
                "S-51,2026-03-01,as-found,1,4000,10,20.0" + Instrument, "S-51,2026-03-01,as-found,2,6040,10,20.0" + Instrument, "S-51,2026-03-01,as-found,3,4000,10,20.0" + Instrument);

        var below = fleet.Device("S-49");
        var above = fleet.Device("S-51");

        Assert.DoesNotContain(below.Findings, f => f.Kind == FindingKind.ContactPoleSpread);
        var spread = Assert.Single(above.Findings, f => f.Kind == FindingKind.ContactPoleSpread);
        Assert.Equal(("2", Severity.Investigate), (spread.Pole, spread.Severity));
        Assert.Equal(51, spread.Value!.Value.Amount, 6);
        Assert.Equal("contact_spread_percent = 50", spread.Policy);
        Assert.Contains("investigate", spread.Message);
        Assert.Contains("more than 50 % above the lowest", spread.Basis);

        // A lab that investigates at 40 % flags S-49's 49 % too, and the basis names the lab's figure, not the guide's.
        var strict = Assert.Single(fleet.Device("S-49", FindingPolicy.Default with { ContactSpreadPercent = 40 }).Findings, f => f.Kind == FindingKind.ContactPoleSpread);
        Assert.StartsWith("lab policy: investigate a pole more than 40 % above the lowest", strict.Basis, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ALimit_CrossedOnlyAfterCorrection_IsOver_AndOneUncrossedByIt_IsNot(Provider provider)
    {
        // Copper, alpha 0.00393 /K (IEC 60228). 7800 uOhm at 5 C: 7800 / (1 - 0.05895) = 8288.6 > 8000.
        // 8200 uOhm at 30 C: 8200 / 1.0393 = 7889.9 < 8000.
        using var fleet = new FindingsStore(provider)
            .Register("COLD,Site,Way 1,iec60898,C,16,1,230,2019-01-01,8000,,,", "WARM,Site,Way 2,iec60898,C,16,1,230,2019-01-01,8000,,,")
            .Contacts("COLD,2026-03-01,as-found,1,7800,10,5" + Instrument, "WARM,2026-03-01,as-found,1,8200,10,30" + Instrument);

        var over = Assert.Single(fleet.Device("COLD").Findings, f => f.Kind == FindingKind.ContactOverLimit);

        Assert.Equal(8288.61, over.Value!.Value.Amount, 2);
        Assert.Equal((8000.0, ReadingUnit.MicroOhms), (over.Limit!.Value.Amount, over.Limit.Value.Unit));
        Assert.Contains("7800 µΩ as measured", over.Message);
        Assert.DoesNotContain(fleet.Device("WARM").Findings, f => f.Kind == FindingKind.ContactOverLimit);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ThreeReadingsOfAPole_AreJudgedByTheirMedian(Provider provider)
    {
        // 5000, 9000 (a poor reading) and 5100: the median is 5100, over a limit of 5050 by the median, not by 9000.
        using var fleet = new FindingsStore(provider)
            .Register("M-01,Site,Way 1,iec60898,C,16,1,230,2019-01-01,5050,,,")
            .Contacts("M-01,2026-03-01,as-found,1,5000,10,20" + Instrument, "M-01,2026-03-01,as-found,1,9000,10,20" + Instrument,
                "M-01,2026-03-01,as-found,1,5100,10,20" + Instrument);

        var over = Assert.Single(fleet.Device("M-01").Findings, f => f.Kind == FindingKind.ContactOverLimit);

        Assert.Equal(5100, over.Value!.Value.Amount, 6);
        Assert.Equal(3, over.RestsOn.Count);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void LowTestCurrent_IsJudgedByTheRating(Provider provider)
    {
        // Common practice (lab policy): about 10 A under 100 A rating, 100 A at and above.
        using var fleet = new FindingsStore(provider)
            .Register("L-16,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,,,", "OK-16,Site,Way 2,iec60898,C,16,1,230,2019-01-01,,,,",
                "L-125,Site,Way 3,iec60898,D,125,3,400,2019-01-01,,,,")
            .Contacts("L-16,2026-03-01,as-found,1,5000,5,20" + Instrument, "OK-16,2026-03-01,as-found,1,5000,10,20" + Instrument,
                "L-125,2026-03-01,as-found,1,300,50,20" + Instrument);

        var small = Assert.Single(fleet.Device("L-16").Findings, f => f.Kind == FindingKind.ContactLowTestCurrent);
        var large = Assert.Single(fleet.Device("L-125").Findings, f => f.Kind == FindingKind.ContactLowTestCurrent);

        Assert.Equal((5.0, 10.0), (small.Value!.Value.Amount, small.Limit!.Value.Amount));
        Assert.Equal((50.0, 100.0), (large.Value!.Value.Amount, large.Limit!.Value.Amount));
        Assert.Empty(fleet.Device("OK-16").Findings);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ARisingPole_IsForecastToReachItsLimit_BeforeItsNextTest(Provider provider)
    {
        // 5000, 5700, 6400, 7100 uOhm on 1 March 2021-2024: Theil–Sen slope ~700 uOhm a year (the years are not quite
        // equal); 8000 is reached about 1.3 years after 2024-03-01, before the next test (sound: 36 months, 2027-03-01).
        using var fleet = new FindingsStore(provider)
            .Register("R-01,Site,Way 1,iec60898,C,16,1,230,2019-01-01,8000,,,")
            .Contacts("R-01,2021-03-01,as-found,1,5000,10,20" + Instrument, "R-01,2022-03-01,as-found,1,5700,10,20" + Instrument,
                "R-01,2023-03-01,as-found,1,6400,10,20" + Instrument, "R-01,2024-03-01,as-found,1,7100,10,20" + Instrument);

        var device = fleet.Device("R-01", asOf: new DateOnly(2024, 6, 1));
        var trend = Assert.Single(device.Findings, f => f.Kind == FindingKind.ContactTrendLimit);

        Assert.Equal(Severity.Plan, trend.Severity);
        Assert.InRange(trend.ForecastOn!.Value, new DateOnly(2025, 5, 1), new DateOnly(2025, 8, 1));
        Assert.Equal(4, trend.RestsOn.Count);

        // 7100 / 5000 - 1 = 42 %: under the 50 % rise policy, so no contact-rise yet; with a 40 % policy there is one.
        Assert.DoesNotContain(device.Findings, f => f.Kind == FindingKind.ContactRise);
        var strict = fleet.Device("R-01", FindingPolicy.Default with { ContactRisePercent = 40 }, new DateOnly(2024, 6, 1));
        Assert.Equal(42, Assert.Single(strict.Findings, f => f.Kind == FindingKind.ContactRise).Value!.Value.Amount, 6);
    }
}
