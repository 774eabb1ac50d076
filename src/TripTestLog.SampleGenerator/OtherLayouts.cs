using System.Globalization;
using System.Text;

namespace TripTestLog.SampleGenerator;

/// <summary>
/// Two invented test-set layouts that are not this tool's own, each with the column-mapping profile that reads it,
/// plus the instrument register. Brackenford's injection set lapsed in September 2025: its tests that month are
/// findings.
/// </summary>
internal static class OtherLayouts
{
    public static IEnumerable<(string RelativePath, string Content)> Files(Random random)
    {
        yield return ("instruments.csv", Instruments());

        // A bench test set: semicolons, decimal commas, day-first dates, its own words for the columns.
        var bench = new StringBuilder("Asset;Date;Current (A);Trip (ms);Held (s);Start;Operator;Remark\n");
        var when = new DateTime(2026, 11, 16, 9, 0, 0);
        foreach (var (tag, rated) in new[] { ("ARW-DB1-Q03", 16.0), ("ARW-DB1-Q04", 20.0), ("ARW-DB2-Q01", 10.0) })
        {
            var c = rated * 2.55 * (1.004 + random.NextDouble() * 0.01);
            var trip = (12 + random.NextDouble() * 20) * 1000;
            bench.Append(string.Join(';', tag, when.ToString("dd.MM.yyyy HH:mm", CultureInfo.InvariantCulture), F(c, "0.00").Replace('.', ','),
                F(trip, "0").Replace('.', ','), "", "cold", "E. Marlow", "after board refit")).Append('\n');
            when = when.AddMinutes(25);
        }

        yield return ("other-layouts/bench-set/bench-2026-11.csv", bench.ToString());
        yield return ("other-layouts/bench-set/bench.profile.json", """
            {
              "profile": "Bench test set export",
              "files": ["bench-*.csv"],
              "delimiter": ";",
              "decimal": ",",
              "date_format": "dd.MM.yyyy HH:mm",
              "columns": {
                "Asset": "asset_tag", "Date": "tested_at", "Current (A)": "current_a", "Trip (ms)": "trip_time_ms",
                "Held (s)": "held_s", "Start": "start", "Operator": "technician", "Remark": "note"
              },
              "constants": { "stage": "as-found", "pole": "all", "instrument": "BENCH-3" }
            }

            """);

        // A portable micro-ohm meter: slashed dates, milli-ohms, a column the lab does not keep.
        var ohm = new StringBuilder("Device,Pole No,Reading mOhm,Test A,Taken,Battery %\n");
        foreach (var (tag, rated) in new[] { ("ARW-DB1-Q03", 16.0), ("ARW-DB1-Q04", 20.0) })
        {
            var r = 90_000 / rated * (1 + (random.NextDouble() - 0.5) * 0.06) / 1000;
            ohm.Append(string.Join(',', tag, "1", F(r, "0.000"), "10", "2026/11/16", F(60 + random.Next(40), "0"))).Append('\n');
        }

        yield return ("other-layouts/portable-ohmmeter/ohm-readings-2026-11.csv", ohm.ToString());
        yield return ("other-layouts/portable-ohmmeter/ohmmeter.profile.json", """
            {
              "profile": "Portable micro-ohm meter export",
              "files": ["ohm-readings-*.csv"],
              "date_format": "yyyy/MM/dd",
              "columns": { "Device": "asset_tag", "Pole No": "pole", "Reading mOhm": "resistance_mohm", "Test A": "test_current_a", "Taken": "tested_at" },
              "ignore": ["Battery %"],
              "constants": { "stage": "as-found", "instrument": "OHM-PORT-2", "technician": "T. Adeyemi" }
            }

            """);
    }

    private static string Instruments()
    {
        var sb = new StringBuilder("instrument,kind,serial,calibrated_on,calibration_due\n");
        foreach (var (name, kind, serial) in new[]
                 {
                     ("INJ-ARW-1", "primary injection set", "PIS-20417"), ("INJ-ARW-2", "primary injection set", "PIS-31190"),
                     ("INJ-BPS-1", "primary injection set", "PIS-20988"), ("INJ-BPS-2", "primary injection set", "PIS-31422"),
                     ("OHM-ARW-1", "micro-ohm meter", "MOM-5521"), ("OHM-BPS-1", "micro-ohm meter", "MOM-5530"),
                     ("INJ-CWD-1", "primary injection set", "PIS-40213"), ("OHM-CWD-1", "micro-ohm meter", "MOM-6604"),
                     ("IR-ARW-1", "insulation tester", "IRT-7710"), ("IR-BPS-1", "insulation tester", "IRT-7724"),
                     ("IR-ARW-2", "insulation tester", "IRT-3305"), ("IR-CWD-1", "insulation tester", "IRT-8816"),
                 })
        {
            for (var year = 2020; year <= 2026; year++)
            {
                // The spare insulation tester was last calibrated in 2024: by 2026 it is out of calibration.
                if (name == "IR-ARW-2" && year > 2024)
                {
                    continue;
                }

                // Brackenford's injection set went unrecalibrated from September 2025 until October.
                var (on, due) = name == "INJ-BPS-1" && year == 2025
                    ? (new DateOnly(2025, 10, 2), new DateOnly(2026, 10, 1))
                    : (new DateOnly(year, 1, 15), new DateOnly(year + 1, 1, 14));
                if (name == "INJ-BPS-1" && year == 2024)
                {
                    due = new DateOnly(2025, 8, 31);
                }

                // Copperwell's ohmmeter went back for calibration late in 2026: its May readings are untraceable.
                if (name == "OHM-CWD-1" && year == 2026)
                {
                    on = new DateOnly(2026, 6, 1);
                }

                sb.Append(string.Join(',', name, kind, serial, Iso(on), Iso(due))).Append('\n');
            }
        }

        sb.Append("BENCH-3,primary injection set,BTS-0088,2026-06-01,2027-05-31\n");
        sb.Append("OHM-PORT-2,micro-ohm meter,MOM-7712,2026-03-10,2027-03-09\n");
        return sb.ToString();
    }

    private static string Iso(DateOnly date) => date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
