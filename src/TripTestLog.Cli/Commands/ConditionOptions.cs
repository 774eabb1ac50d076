using System.CommandLine;
using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Cli.Commands;

/// <summary>The options `findings` and `fleet` share: the database, the lab policy, the date judged, and which devices.</summary>
internal sealed class ConditionOptions
{
    public Option<StoreAddress> Database { get; } = CommonOptions.ExistingDatabase();

    public Option<FileInfo?> Policy { get; } = new("--policy")
    {
        Description = $"Lab policy file (default: {PolicyFile.BesideDatabase} beside the database)",
        HelpName = "FILE",
    };

    public Option<string?> AsOf { get; } = new("--as-of") { Description = "Judge overdue tests as of this date (default: today)", HelpName = "YYYY-MM-DD" };

    public Option<string?> Site { get; } = new("--site") { Description = "Only devices at this site (peers: the whole fleet)", HelpName = "SITE" };

    public Option<string?> Asset { get; } = new("--asset") { Description = "Only this device (peers: the whole fleet)", HelpName = "TAG" };

    public IEnumerable<Option> All => [Database, Policy, AsOf, Site, Asset];

    /// <summary>The options' values checked; null after writing one plain sentence to the error stream.</summary>
    public Resolved? Resolve(ParseResult parse, CliContext cli)
    {
        var db = parse.GetValue(Database)!;
        if (CommonOptions.Missing(cli, db) || !AsOfDate(parse.GetValue(AsOf), cli.Today, cli, out var asOf))
        {
            return null;
        }

        AssetTag? only = null;
        if (parse.GetValue(Asset) is { } asset)
        {
            if (!AssetTag.IsValid(asset, out var reason))
            {
                return Fail(cli, $"--asset: {reason}");
            }

            only = AssetTag.Of(asset);
        }

        if (PolicyLoader.Load(parse.GetValue(Policy), db, out var problem) is not { } policy)
        {
            return Fail(cli, problem!);
        }

        return new Resolved(db, policy.Policy, policy.From, asOf, parse.GetValue(Site), only);
    }

    /// <summary>The date an --as-of option gives, or <paramref name="otherwise"/> when it was not given; false after writing why a value is no date.</summary>
    public static bool AsOfDate(string? text, DateOnly otherwise, CliContext cli, out DateOnly date)
    {
        date = otherwise;
        return text is null || Date(text, "--as-of", cli, out date);
    }

    /// <summary>Parses a YYYY-MM-DD option value, or writes why not.</summary>
    public static bool Date(string text, string option, CliContext cli, out DateOnly date)
    {
        if (DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out date))
        {
            return true;
        }

        cli.Error.WriteLine($"error: {option}: expected a date as YYYY-MM-DD, got '{text}'");
        return false;
    }

    private static Resolved? Fail(CliContext cli, string message)
    {
        cli.Error.WriteLine($"error: {message}");
        return null;
    }

    /// <summary>The checked values.</summary>
    public sealed record Resolved(StoreAddress Database, FindingPolicy Policy, string PolicyFrom, DateOnly AsOf, string? Site, AssetTag? Only)
    {
        public bool AtSite(DeviceCondition device) => Site is null || string.Equals(device.Device.Site, Site, StringComparison.OrdinalIgnoreCase);
    }
}
