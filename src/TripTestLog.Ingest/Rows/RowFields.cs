using TripTestLog.Domain.Codes;
using TripTestLog.Application.Records;
using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Ingest.Columns;

namespace TripTestLog.Ingest.Rows;

/// <summary>
/// Reads the fields of one row by column name, converting units and collecting every problem with its column,
/// so a row reports all of its faults at once rather than the first.
/// </summary>
internal sealed class RowFields
{
    private readonly HeaderMap _map;
    private readonly IReadOnlyList<string> _values;
    private readonly string _file;
    private readonly DateOnly _today;
    private readonly bool _decimalComma;
    private readonly IReadOnlyList<string> _dateFormats;

    public RowFields(HeaderMap map, IReadOnlyList<string> values, string file, long line, DateOnly today, bool decimalComma = false, IReadOnlyList<string>? dateFormats = null)
    {
        _map = map;
        _values = values;
        _file = file;
        Line = line;
        _today = today;
        _decimalComma = decimalComma;
        _dateFormats = dateFormats ?? [];
    }

    public long Line { get; }

    public List<RowProblem> Problems { get; } = [];

    public bool Ok => Problems.Count == 0;

    public void Fail(string column, string reason) => Problems.Add(new RowProblem(_file, Line, Header(column), reason));

    public string Header(string column) => _map.TryGet(column, out var c) ? c.Header : column;

    /// <summary>The trimmed text of a column; empty when the column is absent or blank.</summary>
    public string Text(string column) =>
        _map.TryGet(column, out var c) && c.Index < _values.Count ? _values[c.Index].Trim() : "";

    public string? RequiredText(string column, string what)
    {
        var text = Text(column);
        if (text.Length == 0)
        {
            Fail(column, $"{what} is blank; every row needs one");
            return null;
        }

        return text;
    }

    /// <summary>A number converted to the stored unit and checked against a plausible range [min, max] (in that unit).</summary>
    public double? Number(string column, bool required, double min, double max, string unit, bool allowZero = false)
    {
        var text = Text(column);
        if (text.Length == 0)
        {
            if (required)
            {
                Fail(column, $"a value is required here ({unit})");
            }

            return null;
        }

        return NumberFrom(text, column, min, max, allowZero);
    }

    /// <summary>Parses <paramref name="text"/> as a value of <paramref name="column"/>, with its unit factor and range check.</summary>
    public double? NumberFrom(string text, string column, double min, double max, bool allowZero = false)
    {
        if (text.Contains(',', StringComparison.Ordinal))
        {
            if (!_decimalComma)
            {
                Problems.Add(new RowProblem(_file, Line, Header(column), ReadProblems.DecimalCommaValue(text)) { Cause = ReadProblems.DecimalCommaCause });
                return null;
            }

            if (text.Contains('.', StringComparison.Ordinal))
            {
                Fail(column, $"'{text}' has both a point and a comma, so the decimal mark is ambiguous; write it without a thousands separator, e.g. 1234,5");
                return null;
            }

            text = text.Replace(',', '.');
        }

        // Only plain decimal numbers: "NaN", "Infinity", hex and thousands separators are refused.
        if (!double.TryParse(text, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
                CultureInfo.InvariantCulture, out var raw) || !double.IsFinite(raw))
        {
            Fail(column, $"'{text}' is not a number; write a decimal number with a point, e.g. 12.5");
            return null;
        }

        var factor = _map.TryGet(column, out var c) ? c.Factor : 1.0;
        var value = raw * factor;
        if (value < 0 || (value == 0 && !allowZero))
        {
            Fail(column, $"'{text}' must be above zero");
            return null;
        }

        if (value < min || value > max)
        {
            Fail(column, $"'{text}' is outside the plausible range {Format(min / factor)} to {Format(max / factor)} for this column; check the value and its unit");
            return null;
        }

        return value;
    }

    /// <summary>A yes/no column: yes, no, on, off, true, false, 1 or 0; <paramref name="absent"/> when blank.</summary>
    public bool Flag(string column, bool absent)
    {
        var text = Text(column);
        switch (text.ToLowerInvariant())
        {
            case "":
                return absent;
            case "yes" or "on" or "true" or "1":
                return true;
            case "no" or "off" or "false" or "0":
                return false;
            default:
                Fail(column, $"'{text}' is not yes or no");
                return absent;
        }
    }

    /// <summary>The text of an optional column, or null when blank.</summary>
    public string? OptionalText(string column) => Text(column) is { Length: > 0 } text ? text : null;

    /// <summary>Whether the row gives a value in <paramref name="column"/>.</summary>
    public bool Has(string column) => Text(column).Length > 0;

    public TestedAt? When(string column)
    {
        var text = RequiredText(column, "the test date");
        if (text is null)
        {
            return null;
        }

        if (!TryParseWhen(text, out var when))
        {
            Fail(column, _dateFormats.Count == 0
                ? $"'{text}' is not an ISO 8601 date or date-time; write e.g. 2024-03-18 or 2024-03-18T09:30"
                : $"'{text}' matches neither the profile's date format ({string.Join(" or ", _dateFormats)}) nor ISO 8601");
            return null;
        }

        if (when.Date > _today)
        {
            Fail(column, $"'{text}' is in the future: it is after {_today:yyyy-MM-dd}, the import's date (today, or --as-of)");
            return null;
        }

        if (when.Date.Year < 1950)
        {
            Fail(column, $"'{text}' is before 1950; check the year");
            return null;
        }

        return when;
    }

    private bool TryParseWhen(string text, out TestedAt when)
    {
        foreach (var format in _dateFormats)
        {
            if (DateTime.TryParseExact(text, format, CultureInfo.InvariantCulture, DateTimeStyles.None, out var parsed))
            {
                when = format.Contains('H', StringComparison.Ordinal) || format.Contains('h', StringComparison.Ordinal)
                    ? TestedAt.At(parsed)
                    : TestedAt.OnDate(DateOnly.FromDateTime(parsed));
                return true;
            }
        }

        return TestedAt.TryParse(text, out when);
    }

    public DateOnly? Date(string column, bool allowFuture = false)
    {
        var text = Text(column);
        if (text.Length == 0)
        {
            return null;
        }

        if (!DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
        {
            Fail(column, $"'{text}' is not a date; write yyyy-MM-dd, e.g. 2019-06-30");
            return null;
        }

        if (date > _today && !allowFuture)
        {
            Fail(column, $"'{text}' is in the future: it is after {_today:yyyy-MM-dd}, the import's date (today, or --as-of)");
            return null;
        }

        return date;
    }

    public AssetTag? Tag()
    {
        var text = RequiredText("asset_tag", "the asset tag");
        if (text is null)
        {
            return null;
        }

        // A spreadsheet-safe cell ("'=X", as this tool writes a tag that starts like a formula) reads as the tag itself.
        if (text.Length > 1 && text[0] == '\'' && text[1] is '=' or '+' or '-' or '@')
        {
            text = text[1..];
        }

        if (!AssetTag.IsValid(text, out var reason))
        {
            Fail("asset_tag", reason);
            return null;
        }

        return AssetTag.Of(text);
    }

    public TestStage? Stage()
    {
        var text = RequiredText("stage", "the stage");
        if (text is null)
        {
            return null;
        }

        if (TextCodes.Stage.TryParse(text, out var stage))
        {
            return stage;
        }

        Fail("stage", $"'{text}' is not a stage; write {TextCodes.Stage.Choices}");
        return null;
    }

    public Pole? Pole()
    {
        var text = RequiredText("pole", "the pole");
        if (text is null)
        {
            return null;
        }

        if (!Domain.Measurements.Pole.TryParse(text, out var pole))
        {
            Fail("pole", $"'{text}' is not a pole; write 1, 2, 3, 4, N or all");
            return null;
        }

        return pole;
    }

    private static string Format(double value) => value.ToString("0.######", CultureInfo.InvariantCulture);
}
