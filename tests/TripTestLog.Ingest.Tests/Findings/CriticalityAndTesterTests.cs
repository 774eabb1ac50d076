using TripTestLog.Application.Findings;
using TripTestLog.Application.Import;
using TripTestLog.Domain.Codes;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>
/// The register's criticality orders devices within a grade before their margin past a limit; the insulation tester's
/// calibration is judged as the other instruments' is.
/// </summary>
public sealed class CriticalityAndTesterTests
{
    private const string RegisterHeader =
        "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,criticality";

    private const string InsulationHeader = "asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm,temperature_c,duration_s,instrument";

    // A 690 V incomer reading 99 MOhm at 20 °C and 1000 V DC: 1 % below the 100 MOhm minimum (ANSI/NETA maintenance
    // table, rated up to 1000 V, from memory). A final-circuit way reading 101.5 uOhm at 20 °C against its 100 uOhm
    // limit from the maker's data: 1.5 % over. Both are "repair"; by margin alone the way comes first.
    private static FindingsStore Pair(Provider provider, string incomerCriticality, string wayCriticality) =>
        new FindingsStore(provider)
            .Records(RegisterHeader,
                $"INC-1,Site,Main switchboard incomer,iec60898,C,63,3,690,2019-01-01,,{incomerCriticality}",
                $"WAY-7,Site,DB-3 way 7,iec60898,C,16,1,230,2019-01-01,100,{wayCriticality}")
            .Records(InsulationHeader,
                "INC-1,2026-03-01T10:00,as-found,1-E,1000,99,20,60,",
                "INC-1,2026-03-01T10:00,as-found,2-E,1000,500,20,60,",
                "INC-1,2026-03-01T10:00,as-found,3-E,1000,500,20,60,")
            .Contacts("WAY-7,2026-03-01T11:00,as-found,1,101.5,10,20,,A. Tester");

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void WithinAGrade_TheMoreCriticalIncomer_ComesBeforeAWayFurtherPastItsLimit(Provider provider)
    {
        // Lab practice (common practice, no source): act first where a failure costs most; the margin only orders
        // devices of one criticality.
        using var ranked = Pair(provider, "1", "3");
        using var unranked = Pair(provider, "", "");

        var withCriticality = ranked.Conditions().Where(d => d.NeedsAttention).Order(PriorityOrder.Instance).ToList();
        var byMarginOnly = unranked.Conditions().Where(d => d.NeedsAttention).Order(PriorityOrder.Instance).ToList();

        Assert.Equal(withCriticality[0].Grade, withCriticality[1].Grade);
        Assert.Equal(["INC-1", "WAY-7"], withCriticality.Select(d => d.Device.Tag.Value));
        Assert.Equal([1, 3], withCriticality.Select(d => d.Device.Criticality));
        Assert.Equal(["WAY-7", "INC-1"], byMarginOnly.Select(d => d.Device.Tag.Value));
        Assert.Equal([2, 2], byMarginOnly.Select(d => d.Device.Criticality));
        Assert.Equal(0.015, byMarginOnly[0].Margin!.Value, 6);
        Assert.Equal(0.01, byMarginOnly[1].Margin!.Value, 6);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACriticalityOutsideOneToThree_RefusesTheRegister_NamingLineAndColumn(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        var path = temp.Write("register.csv", RegisterHeader + "\nA-1,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,2\nA-2,Site,Way 2,iec60898,C,16,1,230,2019-01-01,,4\n");

        var outcome = store.Import(path, FindingsStore.Now);

        Assert.Equal(ImportStatus.Refused, outcome.Status);
        var problem = Assert.Single(outcome.Problems);
        Assert.Equal((path, 3L, "criticality"), (problem.File, problem.Line, problem.Column));
        Assert.Contains("'4' is not a criticality; write 1 (highest), 2 or 3", problem.Reason, StringComparison.Ordinal);
        Assert.Equal(0L, db.Scalar("SELECT COUNT(*) FROM devices"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AnInsulationTesterOutOfCalibration_RaisesCalibrationLapsed_AndATraceableOneClosesIt(Provider provider)
    {
        // Lab policy (ISO/IEC 17025 6.4 and 6.5, metrological traceability): a measurement counts only when its
        // instrument was in calibration on the day. IR-2's calibration ran out on 2025-12-31.
        using var fleet = new FindingsStore(provider)
            .Records(RegisterHeader, "B-1,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,")
            .Instruments("IR-2,insulation tester,IT-9,2025-01-01,2025-12-31,,,,,,,,", "IR-3,insulation tester,IT-10,2026-01-01,2026-12-31,,,,,,,,")
            .Records(InsulationHeader, "B-1,2026-03-01T10:00,as-found,1-E,500,800,20,60,IR-2");

        var lapsed = Assert.Single(fleet.Device("B-1").Findings, f => f.Kind == FindingKind.CalibrationLapsed);
        Assert.True(lapsed.Open);
        Assert.Equal("IR-2", lapsed.Instrument);
        Assert.Contains("insulation resistance tests on 2026-03-01: instrument IR-2 calibration lapsed on 2025-12-31", lapsed.Message, StringComparison.Ordinal);

        fleet.Records(InsulationHeader, "B-1,2026-06-01T10:00,as-found,1-E,500,800,20,60,IR-3");

        Assert.DoesNotContain(fleet.Device("B-1").Findings, f => f.Kind == FindingKind.CalibrationLapsed && f.Open);
    }
}
