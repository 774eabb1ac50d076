using CsvHelper;
using TripTestLog.Ingest.Columns;

namespace TripTestLog.Ingest;

/// <summary>
/// The separator, decimal mark and column mapping of one file. Comma files use decimal points. A semicolon file
/// (common where the decimal mark is a comma) is accepted when declared, or when its header splits into a known record
/// kind on semicolons and not on commas; then numbers may use a decimal comma. Anything else is refused.
/// </summary>
internal sealed record Layout(char Separator, bool DecimalComma, ColumnProfile? Profile, string? Problem)
{
    public static Layout Recognise(string path, ReadOptions options)
    {
        string header;
        using (var reader = new StreamReader(path, detectEncodingFromByteOrderMarks: true))
        {
            header = reader.ReadLine() ?? "";
        }

        return FromHeader(header, options);
    }

    /// <summary>The layout of a file whose first line is <paramref name="header"/>.</summary>
    public static Layout FromHeader(string header, ReadOptions options)
    {
        var profile = options.Profile;
        var declared = options.Separator ?? profile?.Delimiter;
        var decimalMark = options.Decimal ?? profile?.Decimal;
        if (declared is { } sep)
        {
            return new Layout(sep, decimalMark is ',' || (decimalMark is null && sep == ';'), profile, null);
        }

        bool Recognised(char separator) => HeaderMap.Resolve(Mapped(header.Split(separator).Select(h => h.Trim('"', ' ')).ToList(), profile).Names).Map is not null;
        var comma = Recognised(',');
        var semicolon = header.Contains(';') && Recognised(';');
        return (comma, semicolon) switch
        {
            // A comma file can hold decimal commas only in quoted fields ("6,85"): read so when declared with --decimal ,.
            (true, false) => new Layout(',', decimalMark is ',', profile, null),
            (false, true) => new Layout(';', decimalMark is not '.', profile, null),
            (true, true) => new Layout(',', false, profile, "the header reads as a record file both with commas and with semicolons; declare the separator with --delimiter"),
            _ => new Layout(',', false, profile, null),
        };
    }

    /// <summary>The header names after the profile's mapping, and how to get each row's values in that order.</summary>
    public MappedHeaders Headers(IReadOnlyList<string> raw) => Mapped(raw, Profile);

    private static MappedHeaders Mapped(IReadOnlyList<string> raw, ColumnProfile? profile)
    {
        if (profile is null)
        {
            return new MappedHeaders(raw.ToList(), Enumerable.Range(0, raw.Count).ToArray(), []);
        }

        var ignore = profile.Ignore.Select(i => i.Trim()).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var names = new List<string>();
        var indexes = new List<int>();
        for (var i = 0; i < raw.Count; i++)
        {
            var name = raw[i].Trim();
            if (ignore.Contains(name))
            {
                continue;
            }

            names.Add(profile.Columns.TryGetValue(name, out var ours) ? ours : name);
            indexes.Add(i);
        }

        var constants = profile.Constants.ToList();
        names.AddRange(constants.Select(c => c.Key));
        return new MappedHeaders(names, indexes.ToArray(), constants.Select(c => c.Value).ToArray());
    }
}

/// <summary>Header names in our terms, the file columns they come from, and constant values appended to every row.</summary>
internal sealed record MappedHeaders(IReadOnlyList<string> Names, int[] Indexes, string[] Constants)
{
    public IReadOnlyList<string> Values(CsvReader csv)
    {
        var values = new string[Indexes.Length + Constants.Length];
        for (var i = 0; i < Indexes.Length; i++)
        {
            values[i] = Indexes[i] < csv.FieldCount ? csv.GetString(Indexes[i]) : "";
        }

        Constants.CopyTo(values, Indexes.Length);
        return values;
    }
}
