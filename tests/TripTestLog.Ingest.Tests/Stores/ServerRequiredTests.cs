namespace TripTestLog.Ingest.Tests.Stores;

/// <summary>CI runs every storage test on both stores: when it asks for the server, a missing one fails the run, not skips it.</summary>
public sealed class ServerRequiredTests
{
    [Fact]
    public void WhenTheRunRequiresTheServer_ItIsConfigured()
    {
        var required = Environment.GetEnvironmentVariable("TRIPTESTLOG_REQUIRE_PG") == "1";

        Assert.False(required && TestDatabase.Server is null,
            $"TRIPTESTLOG_REQUIRE_PG=1 but {TestDatabase.ServerVariable} is not set: start one with scripts/test-server.sh start and source its env file");
        Assert.Equal(required || TestDatabase.Server is not null ? 2 : 1, TestDatabase.Providers.Count);
    }
}
