using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using static TripTestLog.Application.Tests.Records;

namespace TripTestLog.Application.Tests;

/// <summary>
/// The findings rules, fed typed records through an in-memory source: no CSV and no database between the records and
/// the rules, so a failure here is a rule's. (The same rules run through import into both stores in the Ingest tests.)
/// </summary>
public sealed class FindingRuleTests
{
    private static readonly DateOnly AsOf = new(2026, 12, 1);

    [Fact]
    public void InsulationReadings_AreReferredTo20C_BeforeTheMinimum_AndOverRangeIsAtLeastItsValue()
    {
        // A 230 V breaker: ANSI/NETA minimum 25 MOhm (from memory). Halving per 10 K (common practice for insulation
        // referred to 20 C): 20 MOhm at 20 C is below; 20 MOhm read at 30 C is 40 at 20 C (not below); 30 MOhm read at
        // 10 C is 15 at 20 C (below); '>20' is at least 20 and never judged below.
        var source = new MemorySource(Device(Breaker("I-01"), insulation:
        [
            Insulation("I-01", "2026-03-01", "1-E", 20, 20, line: 2),
            Insulation("I-01", "2026-03-01", "1-1'", 20, 30, line: 3),
            Insulation("I-01", "2026-03-01", "1-N", 30, 10, line: 4),
            Insulation("I-01", "2026-03-01", "N-E", 20, 20, overRange: true, line: 5),
        ]));

        var device = Assert.Single(FindingsPipeline.Run(source, FindingPolicy.Default, AsOf));

        var below = device.Findings.Where(f => f.Kind == FindingKind.InsulationBelowMinimum).OrderBy(f => f.Path, StringComparer.Ordinal).ToList();
        Assert.Equal(["1-E", "1-N"], below.Select(f => f.Path));
        Assert.Equal((20.0, 25.0), (below[0].Value!.Value.Amount, below[0].Limit!.Value.Amount));
        Assert.Equal(15, below[1].Value!.Value.Amount, 9);
        Assert.All(below, f => Assert.Equal(Severity.Act, f.Severity));
        Assert.Contains("ANSI/NETA", below[0].Basis, StringComparison.Ordinal);

        // The installation table's 1 MOhm (IEC 60364-6 Table 6.1) passes them all.
        var installation = Assert.Single(FindingsPipeline.Run(source, FindingPolicy.Default with { InsulationTable = InsulationTable.Iec60364Installation }, AsOf));
        Assert.DoesNotContain(installation.Findings, f => f.Kind == FindingKind.InsulationBelowMinimum);
    }

    [Fact]
    public void AnInsulationPathHalvingEachYear_IsFalling_AndIsForecastToReachItsMinimum()
    {
        // 4000, 2000, 1000, 500 MOhm at 20 C: log10 falls 0.301 a year, 50 % a year (Theil-Sen over the four years); 25
        // MOhm (ANSI/NETA, from memory) is log10(500/25) = 1.301 decades below the last, about 4.3 years on (2028-06).
        var source = new MemorySource(Device(Breaker("I-02"), insulation:
        [
            Insulation("I-02", "2021-03-01", "1-E", 4000, 20, line: 2),
            Insulation("I-02", "2022-03-01", "1-E", 2000, 20, line: 3),
            Insulation("I-02", "2023-03-01", "1-E", 1000, 20, line: 4),
            Insulation("I-02", "2024-03-01", "1-E", 500, 20, line: 5),
        ]));

        var device = Assert.Single(FindingsPipeline.Run(source, FindingPolicy.Default, AsOf));

        var falling = Assert.Single(device.Findings, f => f.Kind == FindingKind.InsulationFalling);
        Assert.Equal(50, falling.Value!.Value.Amount, 1);
        Assert.Equal("insulation_fall_percent_per_year = 20", falling.Policy);
        Assert.InRange(falling.ForecastOn!.Value, new DateOnly(2028, 4, 1), new DateOnly(2028, 9, 1));
    }

    [Fact]
    public void ATripTooLateAt255In_IsAnOpenOutOfServiceFinding_AndPutsTheDeviceOutOfService()
    {
        // IEC 60898-1 Table 7 c: at 2.55 In from cold, a breaker of In <= 32 A trips within 1 s < t < 60 s. 40.9 A on a
        // 16 A breaker is 2.56 In; a trip after 75 s is too late (at the 30 C reference ambient, 8.6.1).
        var source = new MemorySource(Device(Breaker("X-01"), trips: [TrippedAfter("X-01", "2026-03-18T12:00", 40.9, 75, 30)]));

        var device = Assert.Single(FindingsPipeline.Run(source, FindingPolicy.Default, AsOf));

        var late = Assert.Single(device.Findings, f => f.Kind == FindingKind.TripOutOfBand);
        Assert.True(late.Open);
        Assert.Equal(Severity.OutOfService, late.Severity);
        Assert.Equal(ConditionGrade.TakeOutOfService, device.Grade);
        Assert.Equal([new RecordSource("trips.csv", 2)], late.RestsOn);
    }

    [Fact]
    public void TheFleetPriority_PutsADeviceToTakeOutOfService_BeforeOneOnlyToInvestigate_AndKeepsOnlyTheTopN()
    {
        // Priority order is lab policy (docs/findings.md), no outside source: the worse grade first.
        var source = new MemorySource(
            Device(Breaker("A-01"), insulation: [Insulation("A-01", "2026-03-01", "1-E", 20, 20)]),
            Device(Breaker("B-01"), trips: [TrippedAfter("B-01", "2026-03-18T12:00", 40.9, 75, 30)]),
            Device(Breaker("C-01")));
        var fleet = new FleetSummary(1);

        foreach (var device in FindingsPipeline.Run(source, FindingPolicy.Default, AsOf))
        {
            fleet.Add(device);
        }

        var top = Assert.Single(fleet.Priority);
        Assert.Equal("B-01", top.Device.Tag.Value);
        Assert.Equal(3, fleet.Sites["Site"].Devices);
    }
}
