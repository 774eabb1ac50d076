using TripTestLog.Application.Findings;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>The lab policy file: the shipped defaults round-trip, overrides apply, mistakes are refused with their line.</summary>
public sealed class PolicyFileTests
{
    [Fact]
    public void TheWrittenDefaults_ReadBackToTheSameText()
    {
        var text = PolicyFile.Write(FindingPolicy.Default);

        var read = PolicyFile.Read(new StringReader(text), "lab-policy.conf", out var problem);

        Assert.Null(problem);
        Assert.Equal(text, PolicyFile.Write(read!));
        Assert.Contains("peer_z_limit = 3.5", text);
        Assert.Contains("contact_spread_percent = 50", text);
        Assert.Contains("insulation_table = neta", text);
    }

    [Fact]
    public void Overrides_ApplyOverTheDefaults_IncludingAFamilysInterval()
    {
        var read = PolicyFile.Read(new StringReader("# ours\ncontact_rise_percent = 30\ninsulation_table = iec60364-6\ndue_months.relay-idmt.sound = 12  # relays yearly\n"),
            "p.conf", out var problem)!;

        Assert.Null(problem);
        Assert.Equal((30.0, InsulationTable.Iec60364Installation), (read.ContactRisePercent, read.InsulationTable));
        Assert.Equal(12, read.MonthsBetweenTests(DeviceFamily.RelayIdmt, ConditionGrade.Sound));
        Assert.Equal(36, read.MonthsBetweenTests(DeviceFamily.Iec60898, ConditionGrade.Sound));
        Assert.Equal(50, read.TripDriftTimePercent);
    }

    [Theory]
    [InlineData("peer_z_limt = 3.5", "p.conf line 2: unknown key peer_z_limt")]
    [InlineData("peer_z_limit = high", "p.conf line 2: peer_z_limit = high is not allowed")]
    [InlineData("trend_min_tests = 2", "p.conf line 2: trend_min_tests = 2 is not allowed")]
    [InlineData("contact_rise_percent", "p.conf line 2: expected \"key = value\"")]
    [InlineData("due_months.relay-idmt.sound = -1", "p.conf line 2: due_months.relay-idmt.sound must be a whole number")]
    public void AMistake_IsRefusedWithItsLine(string line, string expected)
    {
        var read = PolicyFile.Read(new StringReader("# first line\n" + line + "\n"), "p.conf", out var problem);

        Assert.Null(read);
        Assert.StartsWith(expected, problem);
    }

    [Fact]
    public void AKeySetTwice_IsRefused()
    {
        Assert.Null(PolicyFile.Read(new StringReader("peer_z_limit = 3\npeer_z_limit = 4\n"), "p.conf", out var problem));
        Assert.Equal("p.conf line 2: peer_z_limit is set twice", problem);
    }
}
