using System.Runtime.CompilerServices;

namespace TripTestLog.Reports.Tests;

/// <summary>
/// Compares text with a file under golden/, read from the copy beside the test assembly. With UPDATE_GOLDEN=1 the file
/// in the source tree is rewritten instead; review its diff like code.
/// </summary>
internal static class GoldenFile
{
    public static void Matches(string name, string actual, [CallerFilePath] string caller = "")
    {
        actual = actual.ReplaceLineEndings("\n");
        if (Environment.GetEnvironmentVariable("UPDATE_GOLDEN") == "1")
        {
            File.WriteAllText(Path.Combine(Path.GetDirectoryName(caller)!, "golden", name), actual);
            return;
        }

        var path = Path.Combine(AppContext.BaseDirectory, "golden", name);
        Assert.True(File.Exists(path), $"no golden file {name}; run the tests once with UPDATE_GOLDEN=1 and review it");
        if (FirstDifference(File.ReadAllText(path).ReplaceLineEndings("\n"), actual) is { } difference)
        {
            Assert.Fail($"{name} {difference}\nIf the change is meant, run the tests with UPDATE_GOLDEN=1 and review the diff.");
        }
    }

    /// <summary>Where <paramref name="actual"/> first departs from <paramref name="expected"/>, line by line; null when they are equal.</summary>
    public static string? FirstDifference(string expected, string actual)
    {
        var want = expected.Split('\n');
        var got = actual.Split('\n');
        for (var i = 0; i < Math.Max(want.Length, got.Length); i++)
        {
            var w = i < want.Length ? want[i] : null;
            var g = i < got.Length ? got[i] : null;
            if (w != g)
            {
                return $"differs at line {i + 1}:\n  expected: {w ?? "(end of file)"}\n  actual:   {g ?? "(end of file)"}";
            }
        }

        return null;
    }
}
