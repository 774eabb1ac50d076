namespace TripTestLog.Cli.Services;

/// <summary>
/// The *.csv files under a folder, sorted, for a folder import. A link that leads nowhere (its target is gone) or round
/// in a loop is refused by name, and the walk goes on; a linked folder already walked is not walked twice.
/// </summary>
internal static class FolderWalk
{
    /// <summary>The CSV files under <paramref name="root"/>; each entry refused is added to <paramref name="refused"/> as a sentence.</summary>
    public static List<string> CsvFiles(string root, List<string> refused)
    {
        var files = new List<string>();
        var walked = new HashSet<string>(StringComparer.Ordinal);
        Walk(root, files, refused, walked);
        files.Sort(StringComparer.Ordinal);
        return files;
    }

    private static void Walk(string folder, List<string> files, List<string> refused, HashSet<string> walked)
    {
        if (!walked.Add(RealPath(folder)))
        {
            return;
        }

        foreach (var entry in new DirectoryInfo(folder).EnumerateFileSystemInfos("*", new EnumerationOptions { AttributesToSkip = 0 })
                     .OrderBy(e => e.Name, StringComparer.Ordinal))
        {
            var isCsv = entry.Name.EndsWith(".csv", StringComparison.OrdinalIgnoreCase);
            if (entry.LinkTarget is not null)
            {
                FileSystemInfo? target;
                try
                {
                    target = entry.ResolveLinkTarget(returnFinalTarget: true);
                }
                catch (IOException)
                {
                    refused.Add($"{entry.FullName}: a link that leads round in a loop; skipped, the other files were imported");
                    continue;
                }

                if (target is null || !target.Exists)
                {
                    if (isCsv || target is null)
                    {
                        refused.Add($"{entry.FullName}: a link to {entry.LinkTarget}, which does not exist; skipped, the other files were imported");
                    }

                    continue;
                }

                if (target is DirectoryInfo)
                {
                    Walk(entry.FullName, files, refused, walked);
                }
                else if (isCsv)
                {
                    files.Add(entry.FullName);
                }
            }
            else if (entry is DirectoryInfo)
            {
                Walk(entry.FullName, files, refused, walked);
            }
            else if (isCsv)
            {
                files.Add(entry.FullName);
            }
        }
    }

    // The folder's real path, every link along it resolved, so a folder reached through links is walked once.
    private static string RealPath(string folder)
    {
        var full = Path.GetFullPath(folder);
        var real = Path.GetPathRoot(full)!;
        foreach (var part in full[real.Length..].Split(Path.DirectorySeparatorChar, StringSplitOptions.RemoveEmptyEntries))
        {
            var next = new DirectoryInfo(Path.Combine(real, part));
            real = next.LinkTarget is not null ? next.ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? next.FullName : next.FullName;
        }

        return Path.TrimEndingDirectorySeparator(real);
    }
}
