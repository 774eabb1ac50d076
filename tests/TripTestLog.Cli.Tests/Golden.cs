using System.Runtime.CompilerServices;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// Compares output a person reads with a stored file under golden/. Set UPDATE_GOLDEN=1 to rewrite the files, then
/// review the diff like code.
/// </summary>
internal static class Golden
{
    public static void Matches(string name, string actual, [CallerFilePath] string caller = "")
    {
        var path = Path.Combine(Path.GetDirectoryName(caller)!, "golden", name);
        var normalised = actual.ReplaceLineEndings("\n");
        if (Environment.GetEnvironmentVariable("UPDATE_GOLDEN") == "1")
        {
            File.WriteAllText(path, normalised);
            return;
        }

        Assert.True(File.Exists(path), $"no golden file {path}; run the tests once with UPDATE_GOLDEN=1 and review it");
        Assert.Equal(File.ReadAllText(path).ReplaceLineEndings("\n"), normalised);
    }

    /// <summary>The repository's top folder, found from this source file's place in it.</summary>
    public static string RepositoryRoot([CallerFilePath] string caller = "") =>
        Path.GetFullPath(Path.Combine(Path.GetDirectoryName(caller)!, "..", ".."));
}
