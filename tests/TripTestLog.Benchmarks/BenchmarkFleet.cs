using System.Globalization;
using System.Text;

namespace TripTestLog.Benchmarks;

/// <summary>
/// Writes an invented fleet for the benchmark, deterministically: a register of curve-C miniature breakers and their
/// trip tests spread over a number of files. Every row is distinct (its own test time), so a first import adds them all.
/// </summary>
internal static class BenchmarkFleet
{
    public const string TripHeader = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note";

    private static readonly int[] Ratings = [6, 10, 16, 20, 25, 32, 40, 50, 63];

    public static (string Register, IReadOnlyList<string> TripFiles) Write(string folder, int devices, long rows, int files)
    {
        Directory.CreateDirectory(folder);
        var register = Path.Combine(folder, "register.csv");
        using (var w = new StreamWriter(register, false, new UTF8Encoding(false)))
        {
            w.Write("asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\n");
            for (var d = 0; d < devices; d++)
            {
                w.Write($"BNC-{d:D6},Bench Hill Plant,Board {d / 40} way {d % 40},iec60898,C,{Ratings[d % Ratings.Length]},1,230\n");
            }
        }

        var random = new Random(20261202);
        var start = new DateTime(2006, 1, 2, 8, 0, 0);
        var paths = new List<string>();
        var perFile = (rows + files - 1) / files;
        var years = ((rows + devices - 1) / devices + 4) / 5;
        var stride = (int)Math.Clamp(7300 / Math.Max(1, years), 1, 365);
        long written = 0;
        for (var f = 0; f < files && written < rows; f++)
        {
            var path = Path.Combine(folder, $"trips-{f:D2}.csv");
            paths.Add(path);
            using var w = new StreamWriter(path, false, new UTF8Encoding(false), 1 << 16);
            w.Write(TripHeader + "\n");
            for (long i = 0; i < perFile && written < rows; i++, written++)
            {
                var device = (int)(written % devices);
                var rated = Ratings[device % Ratings.Length];
                var multiple = 2.55 * (1 + random.NextDouble() * 0.02);
                var trip = 5 + random.NextDouble() * 40;
                // Each device is tested five times on a yearly test day, 90 minutes apart (so each start is rested and cold).
                var test = written / devices;
                var at = start.AddDays(test / 5 * stride + device % Math.Min(200, stride)).AddMinutes(test % 5 * 90);
                w.Write(string.Create(CultureInfo.InvariantCulture,
                    $"BNC-{device:D6},{at:yyyy-MM-ddTHH:mm},as-found,all,{rated * multiple:0.00},{trip:0.000},,cold,{18 + random.NextDouble() * 8:0.0},INJ-B-{f % 3},R. Okonjo,\n"));
            }
        }

        return (register, paths);
    }
}
