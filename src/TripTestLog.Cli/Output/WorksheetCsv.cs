using System.Globalization;
using System.Text;
using TripTestLog.Application.Worksheet;
using TripTestLog.Domain.Codes;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The worksheet's three pre-filled CSVs, in the record formats that `import` reads, with one extra column, <c>plan</c>,
/// holding the worksheet row (T1, C1, I1 ...). The asset tag, stage, pole or path, start and the planned current or
/// voltage are filled in; the results are left blank. A row still blank when imported is counted as not tested.
/// </summary>
internal sealed class WorksheetCsv : IDisposable
{
    public const string TripFile = "worksheet-trip-tests.csv";
    public const string ContactFile = "worksheet-contact-resistance.csv";
    public const string InsulationFile = "worksheet-insulation.csv";

    // Each file's columns in order, with what the worksheet fills in; a column without a value is left blank.
    private static readonly (string Name, Func<DeviceWorksheet, int, object?> Value)[] TripColumns =
    [
        ("asset_tag", (s, i) => s.Device.Tag.Value),
        ("tested_at", (s, i) => null),
        ("stage", (s, i) => TextCodes.Stage.Of(s.Stage)),
        ("pole", (s, i) => s.Trips[i].Pole.Code),
        ("current_a", (s, i) => new CsvNumber(Exact(s.Trips[i].Current.Value))),
        ("trip_time_s", (s, i) => null),
        ("held_s", (s, i) => null),
        ("start", (s, i) => TextCodes.Start.Of(s.Trips[i].Conditions.Start)),
        ("ambient_c", (s, i) => null),
        ("instrument", (s, i) => null),
        ("technician", (s, i) => null),
        ("note", (s, i) => null),
        ("plan", (s, i) => DeviceWorksheet.RowLabel('T', i)),
    ];

    private static readonly (string Name, Func<DeviceWorksheet, int, object?> Value)[] ContactColumns =
    [
        ("asset_tag", (s, i) => s.Device.Tag.Value),
        ("tested_at", (s, i) => null),
        ("stage", (s, i) => TextCodes.Stage.Of(s.Stage)),
        ("pole", (s, i) => s.Contacts[i].Pole.Code),
        ("resistance_uohm", (s, i) => null),
        ("test_current_a", (s, i) => new CsvNumber(Exact(s.Contacts[i].TestCurrent.Value))),
        ("temperature_c", (s, i) => null),
        ("instrument", (s, i) => null),
        ("technician", (s, i) => null),
        ("plan", (s, i) => DeviceWorksheet.RowLabel('C', i)),
    ];

    private static readonly (string Name, Func<DeviceWorksheet, int, object?> Value)[] InsulationColumns =
    [
        ("asset_tag", (s, i) => s.Device.Tag.Value),
        ("tested_at", (s, i) => null),
        ("stage", (s, i) => TextCodes.Stage.Of(s.Stage)),
        ("path", (s, i) => s.Insulation[i].Path),
        ("test_voltage_v", (s, i) => s.Insulation[i].TestVoltage is { } v ? new CsvNumber(Exact(v.Value)) : null),
        ("resistance_mohm", (s, i) => null),
        ("temperature_c", (s, i) => null),
        ("duration_s", (s, i) => new CsvNumber(Exact(PlannedInsulation.Duration.Value))),
        ("plan", (s, i) => DeviceWorksheet.RowLabel('I', i)),
    ];

    private readonly Sheet _trips;
    private readonly Sheet _contacts;
    private readonly Sheet _insulation;

    public WorksheetCsv(string folder)
    {
        _trips = new Sheet(Path.Combine(folder, TripFile), TripColumns);
        _contacts = new Sheet(Path.Combine(folder, ContactFile), ContactColumns);
        _insulation = new Sheet(Path.Combine(folder, InsulationFile), InsulationColumns);
    }

    // The columns a person fills in at the bench; the worksheet leaves them blank.
    private static readonly Dictionary<string, string[]> ResultColumns = new(StringComparer.Ordinal)
    {
        [TripFile] = ["tested_at", "trip_time_s", "held_s", "ambient_c", "instrument", "technician", "note"],
        [ContactFile] = ["tested_at", "resistance_uohm", "temperature_c", "instrument", "technician"],
        [InsulationFile] = ["tested_at", "resistance_mohm", "temperature_c"],
    };

    /// <summary>
    /// The first worksheet CSV in <paramref name="folder"/> that already holds a result, and the line it is on; null when
    /// none does, so writing the worksheet there loses nothing.
    /// </summary>
    public static (string File, int Line)? FirstWithResults(string folder)
    {
        foreach (var (name, columns) in ResultColumns)
        {
            var path = Path.Combine(folder, name);
            if (!File.Exists(path))
            {
                continue;
            }

            using var reader = new StreamReader(path, Encoding.UTF8);
            var header = Cells(reader.ReadLine() ?? "");
            var watched = columns.Select(c => header.IndexOf(c)).Where(i => i >= 0).ToList();
            var line = 1;
            for (var row = reader.ReadLine(); row is not null; row = reader.ReadLine())
            {
                line++;
                var cells = Cells(row);
                if (watched.Any(i => i < cells.Count && cells[i].Trim().Length > 0))
                {
                    return (path, line);
                }
            }
        }

        return null;
    }

    // One CSV line's cells, with double-quoted cells unquoted (the worksheet writes one record a line).
    private static List<string> Cells(string line)
    {
        var cells = new List<string>();
        var cell = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < line.Length; i++)
        {
            var c = line[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < line.Length && line[i + 1] == '"')
                {
                    cell.Append('"');
                    i++;
                }
                else if (c == '"')
                {
                    quoted = false;
                }
                else
                {
                    cell.Append(c);
                }
            }
            else if (c == '"')
            {
                quoted = true;
            }
            else if (c == ',')
            {
                cells.Add(cell.ToString());
                cell.Clear();
            }
            else
            {
                cell.Append(c);
            }
        }

        cells.Add(cell.ToString());
        return cells;
    }

    public void Add(DeviceWorksheet sheet)
    {
        _trips.Add(sheet, sheet.Trips.Count);
        _contacts.Add(sheet, sheet.Contacts.Count);
        _insulation.Add(sheet, sheet.Insulation.Count);
    }

    public void Dispose()
    {
        _trips.Dispose();
        _contacts.Dispose();
        _insulation.Dispose();
    }

    // A planned current must land on the standard's point, not beside it, or a no-trip limit carried only to lower
    // currents would no longer apply. Six decimals read back within a part in 10^12 (1.13 x 6 A is written 6.78, not
    // 6.779999999999999); the envelopes take a point to within a part in 10^9. Otherwise the round-trip form is written.
    internal static string Exact(double value)
    {
        var text = value.ToString("0.######", CultureInfo.InvariantCulture);
        return Math.Abs(double.Parse(text, CultureInfo.InvariantCulture) - value) <= 1e-12 * Math.Abs(value)
            ? text
            : value.ToString("R", CultureInfo.InvariantCulture);
    }

    // One worksheet file: its columns, written through the one CSV writer.
    private sealed class Sheet : IDisposable
    {
        private readonly StreamWriter _file;
        private readonly CsvOutput _csv;
        private readonly (string Name, Func<DeviceWorksheet, int, object?> Value)[] _columns;

        public Sheet(string path, (string Name, Func<DeviceWorksheet, int, object?> Value)[] columns)
        {
            _file = new StreamWriter(path, append: false, new UTF8Encoding(false));
            _csv = new CsvOutput(_file);
            _columns = columns;
            _csv.Header(columns.Select(c => c.Name));
        }

        public void Add(DeviceWorksheet sheet, int rows)
        {
            for (var i = 0; i < rows; i++)
            {
                foreach (var (_, value) in _columns)
                {
                    _csv.Cell(value(sheet, i));
                }

                _csv.EndRow();
            }
        }

        public void Dispose() => _file.Dispose();
    }
}
