using System.CommandLine;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Cli.Commands;

/// <summary>What `envelope` was asked for.</summary>
internal sealed record EnvelopeRequest(
    DeviceFamily? Family, string FamilyText, string? Curve, double? Rated, double? Ir, double? Tr, double? TrReference, double? Isd, double? Tsd, bool I2t,
    double? Ii, double? Im, double? Pickup, double? Tms, double? HighSet, double? HighSetDelay, double? OpeningTime, FileInfo? Table,
    string? Asset, StoreAddress Database, bool Csv, string Start, bool OnePole, int? Poles, string? Supply, bool ThermalMemory, string? On,
    IReadOnlyList<string> Given);

/// <summary>The options of `envelope`, declared once and read into an <see cref="EnvelopeRequest"/>.</summary>
internal sealed class EnvelopeOptions
{
    private readonly Option<string> _family = new("--family")
    {
        Description = $"Device family: {string.Join(", ", FamilyCodes.All)}",
        DefaultValueFactory = _ => "iec60898",
        HelpName = "FAMILY",
    };

    private readonly Option<string?> _curve = new("--curve") { Description = "iec60898: B, C or D; relay-idmt: the IDMT curve, e.g. standard-inverse", HelpName = "CURVE" };
    private readonly Option<double?> _rated = new("--rated") { Description = "Rated current In, A", HelpName = "AMPERES" };
    private readonly Option<double?> _ir = new("--ir") { Description = "iec60947: long-time or thermal setting Ir, A", HelpName = "AMPERES" };
    private readonly Option<double?> _tr = new("--tr") { Description = "iec60947-electronic: long-time delay tr, s", HelpName = "SECONDS" };
    private readonly Option<double?> _trRef = new("--tr-ref") { Description = "iec60947-electronic: multiple of Ir at which tr is stated (default 6)", HelpName = "MULTIPLE" };
    private readonly Option<double?> _isd = new("--isd") { Description = "iec60947-electronic: short-time pickup Isd, A", HelpName = "AMPERES" };
    private readonly Option<double?> _tsd = new("--tsd") { Description = "iec60947-electronic: short-time delay tsd, s", HelpName = "SECONDS" };
    private readonly Option<bool> _i2t = new("--i2t") { Description = "iec60947-electronic: short-time delay with I²t on" };
    private readonly Option<double?> _ii = new("--ii") { Description = "iec60947-electronic: instantaneous pickup Ii, A", HelpName = "AMPERES" };
    private readonly Option<double?> _im = new("--im") { Description = "iec60947-thermal-magnetic: magnetic setting Im, A", HelpName = "AMPERES" };
    private readonly Option<double?> _pickup = new("--pickup") { Description = "relay-idmt: pickup (start) current, primary A", HelpName = "AMPERES" };
    private readonly Option<double?> _tms = new("--tms") { Description = "relay-idmt: time multiplier (IEC) or time dial (IEEE)", HelpName = "VALUE" };
    private readonly Option<double?> _highSet = new("--highset") { Description = "relay-idmt: definite-time high-set pickup, A", HelpName = "AMPERES" };
    private readonly Option<double?> _highSetDelay = new("--highset-delay") { Description = "relay-idmt: high-set delay, s", HelpName = "SECONDS" };
    private readonly Option<double?> _opening = new("--opening-time") { Description = "relay-idmt: breaker opening time added to the latest time, s", HelpName = "SECONDS" };
    private readonly Option<FileInfo?> _table = new("--table") { Description = "curve-table: a curve table CSV file", HelpName = "FILE" };
    private readonly Option<string?> _asset = new("--asset") { Description = "Draw a registered device's band instead, from --db", HelpName = "TAG" };
    private readonly Option<StoreAddress> _db = CommonOptions.ExistingDatabase();
    private readonly Option<bool> _csv = new("--csv") { Description = "Write CSV: multiple,current_a,min_s,max_s,min_source,max_source,point,typical_min_s,typical_max_s" };

    private readonly Option<string> _start = new("--start")
    {
        Description = "Draw the band for a test from cold or warm (the band check uses for that start)",
        DefaultValueFactory = _ => "cold",
        HelpName = "cold|warm",
    };

    private readonly Option<bool> _onePole = new("--one-pole") { Description = "Draw the band for a test with one pole of a multipole breaker loaded" };
    private readonly Option<int?> _poles = new("--poles") { Description = "iec60898, iec61009: protected poles, 1 to 4 (default 1)", HelpName = "N" };
    private readonly Option<string?> _supply = new("--supply") { Description = "iec60898: ac or dc (IEC 60898-2; curves B and C)", HelpName = "ac|dc" };
    private readonly Option<bool> _thermalMemory = new("--thermal-memory") { Description = "iec60947-electronic: the unit keeps a thermal image" };
    private readonly Option<string?> _on = new("--on") { Description = "With --asset: the settings in force on this date (default: the latest)", HelpName = "YYYY-MM-DD" };

    /// <summary>The options that describe a device, by the families they apply to; the rest apply to every request.</summary>
    public static readonly IReadOnlyDictionary<string, string[]> FamiliesOf = new Dictionary<string, string[]>
    {
        ["--curve"] = ["iec60898", "iec61009", "relay-idmt"],
        ["--rated"] = ["iec60898", "iec61009", "iec60947-electronic", "iec60947-thermal-magnetic", "curve-table"],
        ["--poles"] = ["iec60898", "iec61009"],
        ["--supply"] = ["iec60898", "iec61009"],
        ["--ir"] = ["iec60947-electronic", "iec60947-thermal-magnetic"],
        ["--tr"] = ["iec60947-electronic"],
        ["--tr-ref"] = ["iec60947-electronic"],
        ["--isd"] = ["iec60947-electronic"],
        ["--tsd"] = ["iec60947-electronic"],
        ["--i2t"] = ["iec60947-electronic"],
        ["--ii"] = ["iec60947-electronic"],
        ["--thermal-memory"] = ["iec60947-electronic"],
        ["--im"] = ["iec60947-thermal-magnetic"],
        ["--pickup"] = ["relay-idmt"],
        ["--tms"] = ["relay-idmt"],
        ["--highset"] = ["relay-idmt"],
        ["--highset-delay"] = ["relay-idmt"],
        ["--opening-time"] = ["relay-idmt"],
        ["--table"] = ["curve-table"],
    };

    public IEnumerable<Option> All => [_family, _curve, _rated, _ir, _tr, _trRef, _isd, _tsd, _i2t, _ii, _im, _pickup, _tms, _highSet, _highSetDelay, _opening, _table,
        _poles, _supply, _thermalMemory, _start, _onePole, _asset, _on, _db, _csv];

    public EnvelopeRequest Read(ParseResult p)
    {
        var text = p.GetValue(_family)!;
        return new EnvelopeRequest(FamilyCodes.TryParse(text, out var family) ? family : null, text, p.GetValue(_curve), p.GetValue(_rated), p.GetValue(_ir), p.GetValue(_tr), p.GetValue(_trRef),
            p.GetValue(_isd), p.GetValue(_tsd), p.GetValue(_i2t), p.GetValue(_ii), p.GetValue(_im), p.GetValue(_pickup), p.GetValue(_tms),
            p.GetValue(_highSet), p.GetValue(_highSetDelay), p.GetValue(_opening), p.GetValue(_table), p.GetValue(_asset), p.GetValue(_db)!, p.GetValue(_csv),
            p.GetValue(_start)!, p.GetValue(_onePole), p.GetValue(_poles), p.GetValue(_supply), p.GetValue(_thermalMemory), p.GetValue(_on),
            All.Where(o => p.GetResult(o) is { Implicit: false }).Select(o => o.Name).ToList());
    }
}
