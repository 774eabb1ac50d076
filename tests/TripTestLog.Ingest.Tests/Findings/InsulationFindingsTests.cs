using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>Insulation judged against the chosen table after temperature correction, and trended per path.</summary>
public sealed class InsulationFindingsTests
{
    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void Readings_AreReferredTo20C_BeforeTheMinimum_AndOverRangeIsAtLeastItsValue(Provider provider)
    {
        // A 230 V breaker: ANSI/NETA minimum 25 MOhm (from memory). Halving per 10 K: 20 MOhm at 20 C is below;
        // 20 MOhm read at 30 C is 40 at 20 C (not below); 30 MOhm read at 10 C is 15 at 20 C (below); '>20' is at least 20:
        // never judged below.
        using var fleet = new FindingsStore(provider)
            .Register("I-01,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,,,")
            .Insulation("I-01,2026-03-01,as-found,1-E,500,20,20,60", "I-01,2026-03-01,as-found,1-1',500,20,30,60",
                "I-01,2026-03-01,as-found,1-N,500,30,10,60", "I-01,2026-03-01,as-found,N-E,500,>20,20,60");

        var below = fleet.Device("I-01").Findings.Where(f => f.Kind == FindingKind.InsulationBelowMinimum).OrderBy(f => f.Path).ToList();

        Assert.Equal(["1-E", "1-N"], below.Select(f => f.Path));
        Assert.Equal((20.0, 25.0), (below[0].Value!.Value.Amount, below[0].Limit!.Value.Amount));
        Assert.Equal(15, below[1].Value!.Value.Amount, 9);
        Assert.All(below, f => Assert.Equal(Severity.Act, f.Severity));
        Assert.Contains("ANSI/NETA", below[0].Basis);

        // The installation table's 1 MOhm (IEC 60364-6 Table 6.1) passes them all.
        var installation = fleet.Device("I-01", FindingPolicy.Default with { InsulationTable = InsulationTable.Iec60364Installation });
        Assert.DoesNotContain(installation.Findings, f => f.Kind == FindingKind.InsulationBelowMinimum);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void APathHalvingEachYear_IsFalling_AndIsForecastToReachItsMinimum(Provider provider)
    {
        // 4000, 2000, 1000, 500 MOhm at 20 C: log10 falls 0.301 a year, 50 % a year; 25 MOhm is log10(500/25) = 1.301
        // decades below the last, about 4.3 years on (2028-06), within the 5-year forecast horizon.
        using var fleet = new FindingsStore(provider)
            .Register("I-02,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,,,")
            .Insulation("I-02,2021-03-01,as-found,1-E,500,4000,20,60", "I-02,2022-03-01,as-found,1-E,500,2000,20,60",
                "I-02,2023-03-01,as-found,1-E,500,1000,20,60", "I-02,2024-03-01,as-found,1-E,500,500,20,60");

        var falling = Assert.Single(fleet.Device("I-02").Findings, f => f.Kind == FindingKind.InsulationFalling);

        Assert.Equal(50, falling.Value!.Value.Amount, 1);
        Assert.Equal("insulation_fall_percent_per_year = 20", falling.Policy);
        Assert.InRange(falling.ForecastOn!.Value, new DateOnly(2028, 4, 1), new DateOnly(2028, 9, 1));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AZigzagFallingFasterThanThePolicy_ButWithinItsOwnScatter_IsNotAFall(Provider provider)
    {
        // 4000, 800, 3000, 600 MOhm: log10 3.602, 2.903, 3.477, 2.778. Pairwise slopes -0.699, -0.0625, -0.275, +0.574,
        // -0.0625, -0.699 -> median -0.169 decades a year, a 32 % fall a year (over the 20 % policy). But the readings
        // zigzag by about +/-0.35 decades about the line: the 0.51-decade fall over three years is not twice the scatter.
        using var fleet = new FindingsStore(provider)
            .Register("I-03,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,,,")
            .Insulation("I-03,2021-03-01,as-found,1-E,500,4000,20,60", "I-03,2022-03-01,as-found,1-E,500,800,20,60",
                "I-03,2023-03-01,as-found,1-E,500,3000,20,60", "I-03,2024-03-01,as-found,1-E,500,600,20,60");

        Assert.DoesNotContain(fleet.Device("I-03").Findings, f => f.Kind == FindingKind.InsulationFalling);
    }
}
