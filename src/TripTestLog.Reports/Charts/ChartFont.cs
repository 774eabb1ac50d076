namespace TripTestLog.Reports.Charts;

/// <summary>
/// The font every chart uses, shipped with the project (DejaVu Sans, free licence in Fonts/), so a machine without
/// fonts still draws the charts' text. Registered once with ScottPlot.
/// </summary>
internal static class ChartFont
{
    public const string Name = "DejaVu Sans";
    private static readonly Lazy<string> Registered = new(Register, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>Registers the font (once) and sets it on <paramref name="plot"/>.</summary>
    public static void Apply(ScottPlot.Plot plot)
    {
        _ = Registered.Value;
        plot.Font.Set(Name);
    }

    private static string Register()
    {
        var path = Path.Combine(Path.GetTempPath(), "triptestlog-DejaVuSans-2.37.ttf");
        if (!File.Exists(path))
        {
            using var resource = typeof(ChartFont).Assembly.GetManifestResourceStream("TripTestLog.Reports.DejaVuSans.ttf")
                ?? throw new InvalidOperationException("the chart font is missing from the assembly");
            var temp = path + "." + Guid.NewGuid().ToString("N");
            using (var file = File.Create(temp))
            {
                resource.CopyTo(file);
            }

            File.Move(temp, path, overwrite: true);
        }

        ScottPlot.Fonts.AddFontFile(Name, path);
        return path;
    }
}
