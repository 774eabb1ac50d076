using System.Globalization;
using System.Text;

namespace TripTestLog.SampleGenerator;

/// <summary>
/// A third invented site, Copperwell Depot: one board of ten alike C16 single-pole breakers, so each has enough peers,
/// tested each May from 2021. Most are healthy; Q04 trips far slower than its peers (yet within its band), Q06's contact
/// resistance climbs towards its limit, Q07 has one path whose insulation has failed, Q08 has one path whose insulation
/// halves each year, Q09 left the test programme after 2022, Q10 was last tested with a borrowed set that is not in
/// the instrument register, and Q11, fitted in 2025, has never been tested. It draws from its own seed, so the other
/// sites' records do not change.
/// </summary>
internal static class DepotFleet
{
    public const string Site = "Copperwell Depot";
    public const string Folder = "copperwell";
    private const int Seed = 60947;
    private const double Rated = 16;
    private const int FirstYear = 2021;
    private const int Years = 6;
    private static readonly string[] Technicians = ["R. Okonkwo", "S. Lindqvist"];

    private static string Tag(int i) => $"CWD-DB1-Q{i:00}";

    /// <summary>The register rows, in the register's column order (the industrial tail left empty).</summary>
    public static IEnumerable<string> RegisterRows(string emptyTail)
    {
        var random = new Random(Seed);
        for (var i = 1; i <= 10; i++)
        {
            var commissioned = new DateOnly(2018, 4, 2 + i);
            yield return string.Join(',', Tag(i), Site, $"Board DB1 way {i}", "iec60898", "C", "16", "1", "230", Iso(commissioned),
                F(ContactLimit, "0"), "Halbrook", "HA1", $"H18{random.Next(100000, 999999)}") + emptyTail;
        }

        // Q11 was fitted in 2025 and has never been tested (untested, due since commissioning).
        yield return string.Join(',', Tag(11), Site, "Board DB1 way 11", "iec60898", "C", "16", "1", "230", "2025-06-02",
            F(ContactLimit, "0"), "Halbrook", "HA1", "H18400211") + emptyTail;
    }

    private const double Typical = 90_000 / Rated;
    private static double ContactLimit => Math.Round(Typical * 1.5);

    /// <summary>The depot's record files for every year, relative to the sample folder.</summary>
    public static IEnumerable<(string RelativePath, string Content)> Files()
    {
        var random = new Random(Seed + 1);
        for (var year = 0; year < Years; year++)
        {
            var y = FirstYear + year;
            yield return ($"{Folder}/{y}-trip-tests.csv", Trips(year, random));
            yield return ($"{Folder}/{y}-contact-resistance.csv", Contacts(year, random));
            yield return ($"{Folder}/{y}-insulation.csv", Insulation(year, random));
        }
    }

    private static bool Tested(int i, int year) => i != 9 || year < 2;

    private static string Trips(int year, Random random)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n");
        var day = new DateTime(FirstYear + year, 5, 11, 8, 0, 0);
        for (var i = 1; i <= 10; i++)
        {
            if (!Tested(i, year))
            {
                continue;
            }

            var at = day.AddHours((i - 1) % 5 * 1.5).AddDays((i - 1) / 5);
            var instrument = i == 10 && year == Years - 1 ? "INJ-CWD-LOAN" : "INJ-CWD-1";
            var tech = Technicians[(i + year) % 2];
            var ambient = F(27 + random.NextDouble() * 4, "0.0");

            void Trip(DateTime when, double multiple, double? trip, double? held, string start, string note = "") =>
                Row(sb, Tag(i), Iso(when), "as-found", "all", F(Rated * multiple * (1.003 + random.NextDouble() * 0.01), "0.00"),
                    trip is { } t ? F(t, "0.###") : "", held is { } h ? F(h, "0.###") : "", start, ambient, instrument, tech, note);

            Trip(at, 1.13, null, 3600, "cold");
            Trip(at.AddSeconds(3630), 1.45, 1200 + random.NextDouble() * 600, null, "warm");
            var c = i == 4 ? 50 * (1 + (random.NextDouble() - 0.5) * 0.04) : 20 * (1 + (random.NextDouble() - 0.5) * 0.2);
            Trip(at.AddHours(3), 2.55, c, null, "cold", i == 4 ? "slow against the rest of the board" : "");
            Trip(at.AddHours(3).AddMinutes(10), 5, null, 0.2, "cold");
            Trip(at.AddHours(3).AddMinutes(20), 10, 0.008 + random.NextDouble() * 0.006, null, "cold");
        }

        return sb.ToString();
    }

    private static string Contacts(int year, Random random)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a,temperature_c,instrument,technician\n");
        var date = new DateOnly(FirstYear + year, 5, 10);
        for (var i = 1; i <= 10; i++)
        {
            if (!Tested(i, year))
            {
                continue;
            }

            // Three readings per test, the breaker operated between them; Q06 climbs about 450 uOhm a year.
            var level = i == 6 ? Typical + 450 * year : Typical * (0.95 + 0.01 * i);
            for (var reading = 0; reading < 3; reading++)
            {
                Row(sb, Tag(i), Iso(date), "as-found", "1", F(level * (1 + (random.NextDouble() - 0.5) * 0.02), "0"), "10",
                    F(18 + random.NextDouble() * 4, "0.0"), "OHM-CWD-1", Technicians[(i + year + 1) % 2]);
            }
        }

        return sb.ToString();
    }

    private static string Insulation(int year, Random random)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm,temperature_c,duration_s,instrument\n");
        var date = new DateOnly(FirstYear + year, 5, 10);
        for (var i = 1; i <= 10; i++)
        {
            if (!Tested(i, year))
            {
                continue;
            }

            foreach (var path in new[] { "1-E", "1-1'" })
            {
                var r = 3000 * (1 + (random.NextDouble() - 0.5) * 0.2);
                if (i == 7 && path == "1-1'" && year == Years - 1)
                {
                    r = 12;
                }

                if (i == 8 && path == "1-E")
                {
                    r = 4000 / Math.Pow(2, year);
                }

                Row(sb, Tag(i), Iso(date), "as-found", path, "500", F(r, "0.#"), F(18 + random.NextDouble() * 4, "0.0"), "60", "IR-CWD-1");
            }
        }

        return sb.ToString();
    }

    private static string Iso(DateTime at) => at.ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture);

    private static string Iso(DateOnly date) => date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

    private static void Row(StringBuilder sb, params string[] cells) => sb.Append(string.Join(',', cells)).Append('\n');
}
