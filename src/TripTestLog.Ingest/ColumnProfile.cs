using System.Text.Json;
using System.Text.RegularExpressions;

namespace TripTestLog.Ingest;

/// <summary>
/// A column-mapping profile: how to read a test set's own layout without editing the file. A small JSON file
/// (documented in the README, "Other layouts"):
/// <code>
/// { "profile": "name", "files": ["panel-*.csv"], "delimiter": ";", "decimal": ",", "date_format": "dd.MM.yyyy HH:mm",
///   "columns": { "Their header": "our_column_unit", ... }, "ignore": ["Their column we do not keep"],
///   "constants": { "instrument": "SET-7", "stage": "as-found" } }
/// </code>
/// </summary>
public sealed record ColumnProfile
{
    /// <summary>The profile's name, for messages.</summary>
    public required string Name { get; init; }

    /// <summary>File name patterns (* and ?) the profile applies to when found beside files in a folder.</summary>
    public IReadOnlyList<string> Files { get; init; } = [];

    /// <summary>The field separator, when the layout fixes one.</summary>
    public char? Delimiter { get; init; }

    /// <summary>The decimal separator, '.' or ','.</summary>
    public char? Decimal { get; init; }

    /// <summary>.NET custom date format(s) of the tested_at column, e.g. "dd.MM.yyyy HH:mm".</summary>
    public IReadOnlyList<string> DateFormats { get; init; } = [];

    /// <summary>Their header, case-insensitive, to our column name with its unit suffix.</summary>
    public IReadOnlyDictionary<string, string> Columns { get; init; } = new Dictionary<string, string>();

    /// <summary>Their columns that are deliberately not imported.</summary>
    public IReadOnlyList<string> Ignore { get; init; } = [];

    /// <summary>Our columns with one value for every row (e.g. the instrument).</summary>
    public IReadOnlyDictionary<string, string> Constants { get; init; } = new Dictionary<string, string>();

    /// <summary>Whether the profile names <paramref name="fileName"/> in its file patterns.</summary>
    public bool AppliesTo(string fileName) => Files.Any(pattern =>
        Regex.IsMatch(fileName, "^" + Regex.Escape(pattern).Replace("\\*", ".*").Replace("\\?", ".") + "$", RegexOptions.IgnoreCase));

    /// <summary>Loads a profile, or explains in one sentence (with the JSON line) why it cannot.</summary>
    public static (ColumnProfile? Profile, string? Problem) Load(string path)
    {
        try
        {
            using var doc = JsonDocument.Parse(File.ReadAllText(path));
            var root = doc.RootElement;
            string? Text(string name) => root.TryGetProperty(name, out var v) && v.ValueKind == JsonValueKind.String ? v.GetString() : null;
            List<string> List(string name) => root.TryGetProperty(name, out var v)
                ? v.ValueKind == JsonValueKind.Array ? v.EnumerateArray().Select(e => e.GetString() ?? "").ToList() : [v.GetString() ?? ""]
                : [];
            Dictionary<string, string> Map(string name) => root.TryGetProperty(name, out var v) && v.ValueKind == JsonValueKind.Object
                ? v.EnumerateObject().ToDictionary(p => p.Name.Trim(), p => p.Value.ToString().Trim(), StringComparer.OrdinalIgnoreCase)
                : new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);

            var delimiter = Text("delimiter");
            var decimalMark = Text("decimal");
            if (delimiter is { Length: not 1 } || decimalMark is not (null or "." or ","))
            {
                return (null, $"{path}: \"delimiter\" must be one character and \"decimal\" either \".\" or \",\"");
            }

            if (delimiter is not null && decimalMark == "," && delimiter == ",")
            {
                return (null, $"{path}: a comma cannot be both the delimiter and the decimal separator");
            }

            return (new ColumnProfile
            {
                Name = Text("profile") ?? Path.GetFileNameWithoutExtension(path),
                Files = List("files"),
                Delimiter = delimiter?[0],
                Decimal = decimalMark?[0],
                DateFormats = List("date_format"),
                Columns = Map("columns"),
                Ignore = List("ignore"),
                Constants = Map("constants"),
            }, null);
        }
        catch (JsonException e)
        {
            return (null, $"{path}:{(e.LineNumber ?? 0) + 1}: the profile is not valid JSON ({e.Message.Split('.')[0]})");
        }
    }
}
