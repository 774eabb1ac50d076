using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Services;

/// <summary>
/// Finds the lab policy a command runs under: the file named by --policy, else lab-policy.conf beside the database,
/// else the shipped defaults. Says which, so every output can name it.
/// </summary>
internal static class PolicyLoader
{
    /// <summary>The policy and where it came from; null with <paramref name="problem"/> set when the file cannot be used.</summary>
    public static (FindingPolicy Policy, string From)? Load(FileInfo? explicitFile, StoreAddress database, out string? problem)
    {
        var file = explicitFile ?? new FileInfo(Path.Combine(database.Folder, PolicyFile.BesideDatabase));
        if (explicitFile is null && !file.Exists)
        {
            problem = null;
            return (FindingPolicy.Default, "shipped defaults");
        }

        if (!file.Exists)
        {
            problem = $"--policy: no policy file at {file.FullName}";
            return null;
        }

        try
        {
            using var reader = file.OpenText();
            var policy = PolicyFile.Read(reader, file.Name, out problem);
            return policy is null ? null : (policy, file.FullName);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            problem = $"cannot read the policy file {file.FullName}: {e.Message}";
            return null;
        }
    }
}
