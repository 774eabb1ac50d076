using System.Globalization;
using System.Text;

namespace TripTestLog.SampleGenerator;

/// <summary>
/// The demo's industrial breakers, beside the miniature ones: an electronic trip unit whose Ir was raised in 2023 (and
/// found turned down in 2025), a thermal-magnetic breaker judged with the maker's curve and derating table, two
/// relay-tripped main breakers (IEC and IEEE curves, one re-set in 2024) and one device judged only by a curve table.
/// Every name is made up.
/// </summary>
internal static class IndustrialFleet
{
    public const string RegisterTail = ",settings_from,ir_a,tr_s,isd_a,tsd_s,ii_a,im_a,pickup_a,tms,highset_a,highset_delay_s,opening_time_s,curve_table,ambient_table";

    /// <summary>The register tail for a miniature breaker: none of these columns apply.</summary>
    public static string EmptyTail => new(',', RegisterTail.Count(c => c == ','));

    private const string TripHeader = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note,ir_a,tms\n";

    private static readonly DateOnly IrRaised = new(2023, 2, 1);
    private static readonly DateOnly TmsRaised = new(2024, 5, 1);

    public static IEnumerable<string> RegisterRows()
    {
        // asset, site, location, family, curve, In, poles, V, commissioned, limit, make, model, serial | tail
        yield return "ARW-MSB-Q01,Alder Ridge Works,Main switchboard incomer 2,iec60947-electronic,,630,3,400,2015-06-11,120,Corvane,CX630-E,C15400871"
            + ",,400,10,2400,0.2,4800,,,,,,,,";
        yield return "ARW-MSB-Q01,Alder Ridge Works,Main switchboard incomer 2,iec60947-electronic,,630,3,400,2015-06-11,120,Corvane,CX630-E,C15400871"
            + $",{IrRaised:yyyy-MM-dd},500,10,3000,0.2,6000,,,,,,,,";
        yield return "BPS-MCC-Q01,Brackenford Pumping Station,Motor control centre feeder 4,iec60947-thermal-magnetic,,160,3,400,2016-03-02,350,Halbrook,HT160,H16220934"
            + ",,125,,,,,1250,,,,,,HB-TM160-CURVE,HB-TM-AMBIENT";
        yield return "ARW-MSB-F01,Alder Ridge Works,Main switchboard incomer 1,relay-idmt,standard-inverse,1600,3,400,2014-09-20,40,Corvane,CX1600-R,C14309127"
            + ",,,,,,,,800,0.15,8000,0.05,0.05,,";
        yield return "ARW-MSB-F01,Alder Ridge Works,Main switchboard incomer 1,relay-idmt,standard-inverse,1600,3,400,2014-09-20,40,Corvane,CX1600-R,C14309127"
            + $",{TmsRaised:yyyy-MM-dd},,,,,,,800,0.2,8000,0.05,0.05,,";
        yield return "BPS-MSB-F01,Brackenford Pumping Station,Main switchboard incomer,relay-idmt,ieee-very-inverse,1250,3,400,2013-11-05,45,Halbrook,HR1250,H13881201"
            + ",,,,,,,,600,2,,,0.05,,";
        yield return "ARW-DB3-Q01,Alder Ridge Works,Board DB3 way 1,curve-table,,32,1,230,2018-01-15,3200,Corvane,CV-M32S,C18022514"
            + ",,,,,,,,,,,,,CV-M32-SPECIAL,";
        yield return "BPS-MSB-Q02,Brackenford Pumping Station,Main switchboard bus coupler,iec60947-electronic,,1000,3,400,2017-04-12,80,Halbrook,HE1000,H17300452"
            + ",,800,12,6400,0.3,,,,,,,,,";
        yield return "ARW-MCC-Q01,Alder Ridge Works,Motor control centre feeder 2,iec60947-thermal-magnetic,,100,3,400,2016-08-30,500,Corvane,CT100,C16290011"
            + ",,80,,,,,800,,,,,,,";
    }

    public static string CurveTables() =>
        "table,multiple,min_s,max_s\n"
        // A thermal-magnetic feeder breaker's published band, multiples of Ir.
        + "HB-TM160-CURVE,1.5,120,1800\nHB-TM160-CURVE,2,40,400\nHB-TM160-CURVE,3,12,120\nHB-TM160-CURVE,5,4,35\nHB-TM160-CURVE,8,1.5,12\n"
        // A special miniature breaker's published band, multiples of In.
        + "CV-M32-SPECIAL,1.2,600,\nCV-M32-SPECIAL,1.5,60,3600\nCV-M32-SPECIAL,2,15,600\nCV-M32-SPECIAL,3,4,120\nCV-M32-SPECIAL,5,0.01,30\nCV-M32-SPECIAL,10,0,0.1\nCV-M32-SPECIAL,20,0,0.1\n";

    public static string AmbientTables() =>
        "table,ambient_c,current_factor\n"
        + "HB-TM-AMBIENT,10,1.12\nHB-TM-AMBIENT,20,1.08\nHB-TM-AMBIENT,30,1.04\nHB-TM-AMBIENT,40,1.00\nHB-TM-AMBIENT,50,0.95\nHB-TM-AMBIENT,60,0.90\n";

    public static string Trips(int site, int year, Random random, string technician)
    {
        var sb = new StringBuilder(TripHeader);
        var y = 2021 + year;
        var day = new DateTime(y, site == 0 ? 3 : 9, 10, 8, 0, 0);
        var ambient = 18 + random.NextDouble() * 8;
        void Row(string tag, DateTime at, double current, double trip, string note = "", string ir = "", string tms = "") =>
            sb.Append(string.Join(',', tag, at.ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture), "as-found", "all",
                F(current * (1 + 0.002 + random.NextDouble() * 0.01), "0.0"), F(trip, "0.####"), "", "cold", F(ambient, "0.0"),
                $"INJ-{(site == 0 ? "ARW" : "BPS")}-2", technician, note, ir, tms)).Append('\n');
        double J(double spread) => 1 + (random.NextDouble() * 2 - 1) * spread;

        if (site == 0)
        {
            // Electronic unit: Ir 400 A until February 2023, 500 A after; in 2025 the dial was found at 420 A.
            var ir = new DateOnly(y, 3, 10) >= IrRaised ? 500.0 : 400.0;
            var found = y == 2025 ? 420.0 : ir;
            var (isd, ii) = ir == 400 ? (2400.0, 4800.0) : (3000.0, 6000.0);
            var lt = 10 * Math.Pow(6 / (3 * ir / found), 2);
            Row("ARW-MSB-Q01", day, 3 * ir, lt * J(0.05), y == 2025 ? "Ir dial found at 420 A; reset to 500 A" : "", y == 2025 ? "420" : "");
            Row("ARW-MSB-Q01", day.AddMinutes(20), 1.4 * isd, 0.2 * J(0.05));
            Row("ARW-MSB-Q01", day.AddMinutes(30), 1.3 * ii, 0.02 * J(0.2));

            // Relay-tripped incomer: TMS 0.15 until May 2024, 0.2 after; the trip is timed at the main contacts.
            var tms = new DateOnly(y, 3, 10) >= TmsRaised ? 0.2 : 0.15;
            foreach (var (m, minutes) in new[] { (2.0, 60), (5.0, 70), (8.0, 80) })
            {
                var nominal = tms * 0.14 / (Math.Pow(m, 0.02) - 1);
                Row("ARW-MSB-F01", day.AddMinutes(minutes), 800 * m, (nominal + 0.045) * J(0.02));
            }

            Row("ARW-MSB-F01", day.AddMinutes(90), 1.3 * 8000, (0.05 + 0.045) * J(0.05), "high-set stage");

            // Thermal-magnetic feeder with no curve table: only its magnetic test can be judged.
            Row("ARW-MCC-Q01", day.AddMinutes(100), 3 * 80, 35 * J(0.1), "no maker curve on file");
            Row("ARW-MCC-Q01", day.AddMinutes(110), 1.3 * 800, 0.012 * J(0.2));

            // Curve-table device.
            Row("ARW-DB3-Q01", day.AddMinutes(120), 2 * 32, 90 * J(0.2));
            Row("ARW-DB3-Q01", day.AddMinutes(130), 3 * 32, 25 * J(0.2));
            Row("ARW-DB3-Q01", day.AddMinutes(140), 10 * 32, 0.012 * J(0.2));
        }
        else
        {
            // Thermal-magnetic feeder: 3 Ir is judged by the maker's curve, corrected for the pump hall's ambient.
            Row("BPS-MCC-Q01", day, 3 * 125, 45 * J(0.1));
            Row("BPS-MCC-Q01", day.AddMinutes(20), 1.3 * 1250, 0.015 * J(0.2));

            // Bus coupler: electronic unit, long time and short time only (no instantaneous), tsd 0.3 s.
            Row("BPS-MSB-Q02", day.AddMinutes(40), 4 * 800, 12 * Math.Pow(6.0 / 4, 2) * J(0.06));
            Row("BPS-MSB-Q02", day.AddMinutes(50), 1.3 * 6400, 0.3 * J(0.05));

            // IEEE very inverse relay, time dial 2.
            foreach (var (m, minutes) in new[] { (2.0, 60), (5.0, 70), (10.0, 80) })
            {
                var nominal = 2 * (19.61 / (m * m - 1) + 0.491);
                Row("BPS-MSB-F01", day.AddMinutes(minutes), 600 * m, (nominal + 0.045) * J(0.02));
            }
        }

        return sb.ToString();
    }

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
