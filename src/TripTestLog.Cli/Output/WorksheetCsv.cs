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

    private readonly StreamWriter _trips;
    private readonly StreamWriter _contacts;
    private readonly StreamWriter _insulation;

    public WorksheetCsv(string folder)
    {
        _trips = Open(Path.Combine(folder, TripFile), "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note,plan");
        _contacts = Open(Path.Combine(folder, ContactFile), "asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a,temperature_c,instrument,technician,plan");
        _insulation = Open(Path.Combine(folder, InsulationFile), "asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm,temperature_c,duration_s,plan");
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
        var tag = CsvCell.Text(sheet.Device.Tag.Value);
        var stage = TextCodes.Stage.Of(sheet.Stage);
        for (var i = 0; i < sheet.Trips.Count; i++)
        {
            var t = sheet.Trips[i];
            _trips.WriteLine($"{tag},,{stage},{t.Pole.Code},{Exact(t.Current.Value)},,,{TextCodes.Start.Of(t.Conditions.Start)},,,,,{DeviceWorksheet.RowLabel('T', i)}");
        }

        for (var i = 0; i < sheet.Contacts.Count; i++)
        {
            var c = sheet.Contacts[i];
            _contacts.WriteLine($"{tag},,{stage},{c.Pole.Code},,{Exact(c.TestCurrent.Value)},,,,{DeviceWorksheet.RowLabel('C', i)}");
        }

        for (var i = 0; i < sheet.Insulation.Count; i++)
        {
            var p = sheet.Insulation[i];
            var voltage = p.TestVoltage is { } v ? Exact(v.Value) : "";
            _insulation.WriteLine($"{tag},,{stage},{CsvCell.Text(p.Path)},{voltage},,,{Exact(PlannedInsulation.Duration.Value)},{DeviceWorksheet.RowLabel('I', i)}");
        }
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

    private static StreamWriter Open(string path, string header)
    {
        var writer = new StreamWriter(path, append: false, new UTF8Encoding(false));
        writer.WriteLine(header);
        return writer;
    }
}
