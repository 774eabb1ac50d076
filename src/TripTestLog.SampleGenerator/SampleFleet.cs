using System.Globalization;
using System.Text;

namespace TripTestLog.SampleGenerator;

/// <summary>
/// The invented demo fleet: two sites, 40 miniature breakers, annual tests from 2021 to 2026. Every name here is made
/// up. Most devices are healthy; three drift, one fails the 1.45 In test in its last year, and one pole's contact
/// resistance rises until it is cleaned. A fixed seed makes the files the same on every run.
/// </summary>
internal static class SampleFleet
{
    private const int Seed = 60898;
    private const int FirstYear = 2021;
    private const int Years = 6;

    private static readonly string[] SiteNames = ["Alder Ridge Works", "Brackenford Pumping Station"];
    private static readonly string[] SiteFolders = ["alder-ridge", "brackenford"];
    private static readonly string[] SiteCodes = ["ARW", "BPS"];
    private static readonly int[] TestMonth = [3, 9];
    private static readonly string[][] Technicians = [["E. Marlow", "T. Adeyemi"], ["K. Sorensen", "P. Quill"]];
    private static readonly string[] Makes = ["Corvane", "Halbrook"];

    public static IReadOnlyList<string> WriteTo(string folder)
    {
        var fleet = Fleet();
        var random = new Random(Seed);
        var traits = fleet.ToDictionary(d => d.Tag, _ => Traits.Draw(random));
        var written = new List<string>();

        Directory.CreateDirectory(folder);
        written.Add(Write(Path.Combine(folder, "device-register.csv"), Register(fleet, random)));
        written.Add(Write(Path.Combine(folder, "curve-tables.csv"), new StringBuilder(IndustrialFleet.CurveTables())));
        written.Add(Write(Path.Combine(folder, "ambient-tables.csv"), new StringBuilder(IndustrialFleet.AmbientTables())));
        written.Add(Write(Path.Combine(folder, "lab-policy.conf"), new StringBuilder(
            "# The invented labs' policy: the shipped defaults (see `triptestlog policy`), except that every instrument\n"
            + "# must be in the instrument register. The demo puts this file beside its database.\n"
            + "require_registered_instruments = yes\n")));
        var industrial = new Random(Seed + 1);
        for (var site = 0; site < SiteNames.Length; site++)
        {
            var siteFolder = Path.Combine(folder, SiteFolders[site]);
            Directory.CreateDirectory(siteFolder);
            var devices = fleet.Where(d => d.Site == site).ToList();
            for (var year = 0; year < Years; year++)
            {
                var y = FirstYear + year;
                written.Add(Write(Path.Combine(siteFolder, $"{y}-trip-tests.csv"), Trips(devices, traits, site, year, random)));
                written.Add(Write(Path.Combine(siteFolder, $"{y}-contact-resistance.csv"), Contacts(devices, traits, site, year, random)));
                written.Add(Write(Path.Combine(siteFolder, $"{y}-insulation.csv"), Insulation(devices, site, year, random)));
                written.Add(Write(Path.Combine(siteFolder, $"{y}-industrial-trip-tests.csv"),
                    new StringBuilder(IndustrialFleet.Trips(site, year, industrial, Technicians[site][year % 2]))));
            }
        }

        foreach (var (relative, content) in OtherLayouts.Files(new Random(Seed + 2)).Concat(DepotFleet.Files()))
        {
            var path = Path.Combine(folder, relative);
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            written.Add(Write(path, new StringBuilder(content)));
        }

        return written;
    }

    internal static List<FleetDevice> Fleet()
    {
        double[] ratings = [6, 10, 16, 20, 25, 32, 40, 50, 63, 16, 10, 20, 32, 16, 40, 63, 80, 100, 125, 25];
        char[] curves = ['B', 'B', 'C', 'C', 'C', 'C', 'C', 'D', 'C', 'B', 'C', 'C', 'D', 'C', 'B', 'D', 'C', 'C', 'D', 'C'];
        int[] poles = [1, 1, 1, 1, 3, 3, 3, 3, 4, 1, 1, 2, 3, 1, 3, 3, 3, 4, 3, 1];
        var fleet = new List<FleetDevice>();
        for (var site = 0; site < 2; site++)
        {
            for (var i = 0; i < ratings.Length; i++)
            {
                var board = i < 10 ? "DB1" : "DB2";
                var tag = $"{SiteCodes[site]}-{board}-Q{i % 10 + 1:00}";
                var story = (site, i) switch
                {
                    (0, 4) or (1, 7) or (1, 13) => DeviceStory.DriftingSlow,
                    (1, 2) => DeviceStory.FailsConventionalTrip,
                    (0, 11) => DeviceStory.RisingContactResistance,
                    _ => DeviceStory.Healthy,
                };
                fleet.Add(new FleetDevice(tag, site, $"Board {board} way {i % 10 + 1}", site == 1 ? curves[(i + 3) % curves.Length] : curves[i],
                    ratings[i], poles[i], story));
            }
        }

        return fleet;
    }

    private static StringBuilder Register(List<FleetDevice> fleet, Random random)
    {
        var sb = new StringBuilder("asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial"
            + IndustrialFleet.RegisterTail + ",criticality\n");
        foreach (var d in fleet)
        {
            var make = Makes[d.Site];
            var commissioned = new DateOnly(2012 + random.Next(8), 1 + random.Next(12), 1 + random.Next(28));
            var voltage = d.Poles == 1 ? 230 : 400;
            // The model names the maker's range by pole count; curve and rating have columns of their own, so a range's
            // breakers group together when the fleet is read by make and model.
            var model = $"{make[..2].ToUpperInvariant()}{d.Poles}";
            var serial = $"{make[0]}{commissioned.Year % 100:00}{random.Next(100000, 999999)}";
            Row(sb, d.Tag, SiteNames[d.Site], d.Location, "iec60898", d.Curve.ToString(), F(d.Rated, "0"), d.Poles.ToString(CultureInfo.InvariantCulture),
                F(voltage, "0"), commissioned.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture), F(ContactLimit(d), "0"), make, model, serial + IndustrialFleet.EmptyTail + ",");
        }

        foreach (var row in IndustrialFleet.RegisterRows().Concat(DepotFleet.RegisterRows(IndustrialFleet.EmptyTail)))
        {
            // An incomer's loss stops its site: criticality 1. Every other device takes the default, 2.
            sb.Append(row).Append(row.Contains("incomer", StringComparison.OrdinalIgnoreCase) ? ",1" : ",").Append('\n');
        }

        return sb;
    }

    private static StringBuilder Trips(List<FleetDevice> devices, Dictionary<string, Traits> traits, int site, int year, Random random)
    {
        // Brackenford's test set writes milliseconds; Alder Ridge's writes seconds.
        var ms = site == 1;
        var sb = new StringBuilder(ms
            ? "asset_tag,tested_at,stage,pole,current_a,trip_time_ms,held_ms,start,ambient_c,instrument,technician,note\n"
            : "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n");
        var day = new DateTime(FirstYear + year, TestMonth[site], 6, 8, 0, 0);
        var instrument = $"INJ-{SiteCodes[site]}-1";
        var last = year == Years - 1;
        foreach (var (d, index) in devices.Select((d, i) => (d, i)))
        {
            var t = traits[d.Tag];
            var at = day.AddDays(index / 5).AddHours(index % 5 * 1.5);
            var tech = Technicians[site][(index + year) % 2];
            // The labs test miniature breakers in a test room held near IEC 60898-1's 30 °C reference.
            var ambient = F(27 + random.NextDouble() * 5, "0.0");
            if (site == 0 && year == 1 && index == 0)
            {
                // Tested in the unheated pump room in winter: far from the 30 °C reference, with no correction table.
                ambient = "6.0";
            }

            var longHold = d.Rated <= 63 ? 3600.0 : 7200.0;
            var cMax = d.Rated <= 32 ? 60.0 : 120.0;
            var (low, high) = d.Curve switch { 'B' => (3.0, 5.0), 'C' => (5.0, 10.0), _ => (10.0, 20.0) };

            void Trip(DateTime when, string pole, double multiple, double? trip, double? held, string start, string note = "")
            {
                var current = d.Rated * multiple * (1 + 0.002 + random.NextDouble() * 0.012);
                Row(sb, d.Tag, Iso(when), "as-found", pole, F(current, "0.00"),
                    trip is { } x ? Time(x, ms) : "", held is { } h ? Time(h, ms) : "", start, ambient, instrument, tech, note);
            }

            Trip(at, "all", 1.13, null, longHold, "cold");
            var fails = d.Story == DeviceStory.FailsConventionalTrip && last;
            Trip(at.AddSeconds(longHold + 30), "all", 1.45, fails ? null : t.ConventionalTrip * longHold / 3600 * Jitter(random, 0.08), fails ? longHold : null, "warm",
                fails ? "no trip within the conventional time; breaker tagged for replacement" : "");
            var drift = d.Story == DeviceStory.DriftingSlow ? 1 + 0.22 * year : 1.0;
            Trip(at.AddHours(3), "all", 2.55, Math.Min(t.ThermalFraction * cMax * drift * Jitter(random, 0.06), cMax * 0.97), null, "cold",
                drift > 1.8 ? "trip time rising year on year" : "");
            if (year == 2)
            {
                // That year's extended programme added a point between the standard's, judged on the drawn band.
                var band2 = t.ThermalFraction * cMax * Math.Pow(2.55 / 2.0, 4.5) * drift * Jitter(random, 0.05);
                Trip(at.AddHours(2.5), "all", 2.0, band2, null, "cold", "extended programme");
            }

            if (year == 3 && index == 5)
            {
                // Started from cold by mistake: the 1.45 In limit applies warm, so the hold cannot be judged.
                Trip(at.AddHours(4), "all", 1.45, null, longHold, "cold", "re-test: started cold in error");
            }

            for (var p = 1; p <= d.Poles; p++)
            {
                Trip(at.AddHours(3).AddMinutes(10 + p), p.ToString(CultureInfo.InvariantCulture), low, null, 0.2, "cold");
                Trip(at.AddHours(3).AddMinutes(20 + p), p.ToString(CultureInfo.InvariantCulture), high, t.MagneticTime * Jitter(random, 0.15), null, "cold");
            }
        }

        return sb;
    }

    private static StringBuilder Contacts(List<FleetDevice> devices, Dictionary<string, Traits> traits, int site, int year, Random random)
    {
        // Brackenford's ohmmeter exports milli-ohms.
        var milli = site == 1;
        var sb = new StringBuilder(milli
            ? "asset_tag,tested_at,stage,pole,resistance_mohm,test_current_a,temperature_c,instrument,technician\n"
            : "asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a,temperature_c,instrument,technician\n");
        var date = new DateOnly(FirstYear + year, TestMonth[site], 5);
        foreach (var (d, index) in devices.Select((d, i) => (d, i)))
        {
            var tech = Technicians[site][(index + year + 1) % 2];
            var current = d.Rated <= 32 ? 10.0 : 50.0;
            var rising = d.Story == DeviceStory.RisingContactResistance;
            for (var p = 1; p <= d.Poles; p++)
            {
                var r = Typical(d) * traits[d.Tag].PoleFactor(p) * Jitter(random, 0.03);
                if (rising && p == 1)
                {
                    r *= Math.Pow(1.2, year);
                }

                Row(sb, d.Tag, Iso(date), "as-found", p.ToString(CultureInfo.InvariantCulture), milli ? F(r / 1000, "0.000") : F(r, "0"),
                    F(current, "0"), F(17 + random.NextDouble() * 6, "0.0"), $"OHM-{SiteCodes[site]}-1", tech);
                if (rising && p == 1 && year == Years - 1)
                {
                    // Terminals cleaned and re-torqued, then measured again.
                    Row(sb, d.Tag, Iso(date), "as-left", "1", F(Typical(d) * 1.04, "0"), F(current, "0"), F(19.5, "0.0"), $"OHM-{SiteCodes[site]}-1", tech);
                }
            }
        }

        return sb;
    }

    private static StringBuilder Insulation(List<FleetDevice> devices, int site, int year, Random random)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm,temperature_c,duration_s,instrument\n");
        var date = new DateOnly(FirstYear + year, TestMonth[site], 5);
        foreach (var d in devices)
        {
            var paths = Enumerable.Range(1, d.Poles).SelectMany(p => new[] { $"{p}-E", $"{p}-{p}'" })
                .Concat(d.Poles > 1 ? Enumerable.Range(1, d.Poles - 1).Select(p => $"{p}-{p + 1}") : []);
            foreach (var path in paths)
            {
                // Each path keeps its own level from year to year, within ±10 %: healthy insulation does not wander.
                var r = PathLevel(d.Tag, path) * (1 + (random.NextDouble() - 0.5) * 0.2);
                var text = r > 10000 ? ">10000" : F(r, "0");
                // The policy's table asks 1000 V DC for a 400 V breaker and 500 V DC up to 250 V; in its last year one 400 V
                // breaker was tested at 500 V DC by mistake (insulation-test-voltage).
                var volts = d.Poles == 1 ? "500" : d.Tag == "ARW-DB1-Q06" && year == Years - 1 ? "500" : "1000";
                // In its last year one way was tested with a borrowed tester whose calibration had run out.
                var tester = d.Tag == "ARW-DB1-Q07" && year == Years - 1 ? "IR-ARW-2" : $"IR-{SiteCodes[site]}-1";
                Row(sb, d.Tag, Iso(date), "as-found", path, volts, text, F(16 + random.NextDouble() * 8, "0.0"), "60", tester);
            }
        }

        return sb;
    }

    /// <summary>A path's own insulation level, 800 MOhm to about 16 GOhm, fixed by its name rather than drawn in sequence.</summary>
    private static double PathLevel(string tag, string path)
    {
        var hash = 17u;
        foreach (var c in tag + "|" + path)
        {
            hash = hash * 31 + c;
        }

        return 800 * Math.Exp(hash % 1000 / 1000.0 * 3.0);
    }

    /// <summary>An invented typical contact resistance: roughly inverse to the rating, as for small breakers.</summary>
    private static double Typical(FleetDevice d) => 90_000 / d.Rated;

    private static double ContactLimit(FleetDevice d) => Math.Round(Typical(d) * 1.5);

    private static double Jitter(Random random, double spread) => 1 + (random.NextDouble() * 2 - 1) * spread;

    private static string Time(double seconds, bool ms) => ms ? F(seconds * 1000, "0.#") : F(seconds, "0.###");

    private static string Iso(DateTime at) => at.ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture);

    private static string Iso(DateOnly date) => date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

    private static void Row(StringBuilder sb, params string[] cells) => sb.Append(string.Join(',', cells)).Append('\n');

    private static string Write(string path, StringBuilder content)
    {
        File.WriteAllText(path, content.ToString(), new UTF8Encoding(false));
        return path;
    }

    /// <summary>Per-device constants drawn once, so a device behaves alike from year to year.</summary>
    private sealed record Traits(double ConventionalTrip, double ThermalFraction, double MagneticTime, double[] Poles)
    {
        public static Traits Draw(Random random) => new(
            900 + random.NextDouble() * 1500,
            0.25 + random.NextDouble() * 0.2,
            0.006 + random.NextDouble() * 0.01,
            [1 + (random.NextDouble() - 0.5) * 0.1, 1 + (random.NextDouble() - 0.5) * 0.1, 1 + (random.NextDouble() - 0.5) * 0.1, 1 + (random.NextDouble() - 0.5) * 0.1]);

        public double PoleFactor(int pole) => Poles[pole - 1];
    }
}
