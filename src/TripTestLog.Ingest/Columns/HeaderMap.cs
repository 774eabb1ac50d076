using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>
/// The header row of a file resolved against a schema: for each known column, its index and unit factor.
/// Built once per file, so rows are read by index.
/// </summary>
internal sealed class HeaderMap
{
    private readonly Dictionary<string, MappedColumn> _columns;

    private HeaderMap(RecordSchema schema, Dictionary<string, MappedColumn> columns)
    {
        Schema = schema;
        _columns = columns;
    }

    /// <summary>The column a rejects file adds; ignored on import.</summary>
    public const string RejectsColumn = "reject_reasons";

    public RecordSchema Schema { get; }

    public bool TryGet(string name, out MappedColumn column) => _columns.TryGetValue(name, out column!);

    public bool Has(string name) => _columns.ContainsKey(name);

    /// <summary>Recognises the kind from the header and maps every column, or returns the reasons it cannot.</summary>
    public static (HeaderMap? Map, IReadOnlyList<(string Column, string Reason)> Problems) Resolve(IReadOnlyList<string> headers)
    {
        var normalised = headers.Select(h => h.Trim().ToLowerInvariant()).ToArray();
        var schema = Recognise(normalised);
        if (schema is null)
        {
            return (null, [("", "the header matches no record kind: a device register needs family and rated_current_a, "
                + "trip tests trip_time_s or held_s, contact resistance test_current_a, insulation resistance path and test_voltage_v, "
                + "a curve table table and multiple, an ambient table table and current_factor, an instrument register calibrated_on and calibration_due "
                + "(files are comma-separated UTF-8 with a header row, or semicolon-separated with decimal commas; another layout needs a profile)")]);
        }

        var problems = new List<(string, string)>();
        var columns = new Dictionary<string, MappedColumn>();
        for (var i = 0; i < normalised.Length; i++)
        {
            var header = normalised[i];
            if (header.Length == 0)
            {
                problems.Add(($"#{i + 1}", "the header has an empty column name"));
                continue;
            }

            // A rejects file's reasons column is skipped, so fixed rejects import as they are.
            if (header == RejectsColumn)
            {
                continue;
            }

            var (spec, factor, problem) = Match(schema, header);
            if (problem is not null)
            {
                problems.Add((headers[i].Trim(), problem));
                continue;
            }

            if (columns.TryGetValue(spec!.Name, out var earlier))
            {
                problems.Add((headers[i].Trim(), $"{spec.Name} appears twice (also as {earlier.Header}); keep one"));
                continue;
            }

            columns[spec.Name] = new MappedColumn(spec, i, headers[i].Trim(), factor);
        }

        foreach (var missing in schema.Columns.Where(c => c.Required && !columns.ContainsKey(c.Name)))
        {
            problems.Add((missing.Example, $"required column {missing.Example} is missing from this {Describe(schema.Kind)} file"));
        }

        if (schema.Kind == RecordKind.TripTests && !columns.ContainsKey("trip_time") && !columns.ContainsKey("held"))
        {
            problems.Add(("trip_time_s", "a trip test file needs trip_time_s, held_s or both"));
        }

        return problems.Count == 0 ? (new HeaderMap(schema, columns), problems) : (null, problems);
    }

    public static string Describe(RecordKind kind) => kind switch
    {
        RecordKind.DeviceRegister => "device register",
        RecordKind.TripTests => "trip test",
        RecordKind.ContactResistance => "contact resistance",
        RecordKind.InsulationResistance => "insulation resistance",
        RecordKind.CurveTable => "curve table",
        RecordKind.AmbientTable => "ambient table",
        RecordKind.InstrumentRegister => "instrument register",
        _ => kind.ToString(),
    };

    private static RecordSchema? Recognise(string[] headers)
    {
        var bases = headers.Select(BaseName).ToHashSet();
        var scored = RecordSchema.All
            .Select(s => (Schema: s, Signature: s.Signature.Count(bases.Contains), All: s.Columns.Count(c => bases.Contains(c.Name))))
            .Where(x => x.Signature > 0)
            .OrderByDescending(x => x.Signature).ThenByDescending(x => x.All)
            .ToList();
        if (scored.Count == 0)
        {
            return null;
        }

        return scored.Count > 1 && scored[0].Signature == scored[1].Signature && scored[0].All == scored[1].All ? null : scored[0].Schema;
    }

    private static string BaseName(string header)
    {
        var cut = header.LastIndexOf('_');
        return cut > 0 && !RecordSchema.All.Any(s => s.Find(header) is not null) ? header[..cut] : header;
    }

    private static (ColumnSpec? Spec, double Factor, string? Problem) Match(RecordSchema schema, string header)
    {
        if (schema.Find(header) is { } exact)
        {
            return UnitSuffix.TakesSuffix(exact.Quantity)
                ? (null, 0, $"{header} needs a unit suffix: {UnitSuffix.Accepted(exact.Quantity)}")
                : (exact, 1.0, null);
        }

        var cut = header.LastIndexOf('_');
        if (cut > 0 && schema.Find(header[..cut]) is { } spec && UnitSuffix.TakesSuffix(spec.Quantity))
        {
            var suffix = header[(cut + 1)..];
            return UnitSuffix.FactorFor(spec.Quantity, suffix) is { } factor
                ? (spec, factor, null)
                : (null, 0, $"unknown unit '_{suffix}' for {spec.Name}: use {UnitSuffix.Accepted(spec.Quantity)}");
        }

        var known = string.Join(", ", schema.Columns.Select(c => c.Example));
        return (null, 0, $"unknown column for a {Describe(schema.Kind)} file; the columns are {known}");
    }
}
