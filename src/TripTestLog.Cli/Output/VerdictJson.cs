using System.Text.Json;
using System.Text.Json.Serialization;
using TripTestLog.Application.Check;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The verdicts for programs: a JSON array, one object per trip test. The field names and meanings are documented in
/// the README ("check --json") and pinned by a golden test; add fields at the end, never rename. Given
/// <paramref name="rows"/>, it takes each test's row from there, shared with another writer of the same tests.
/// </summary>
internal sealed class VerdictJson(TextWriter writer, VerdictRows? rows = null) : IVerdictWriter
{
    private readonly JsonOutput _output = new(writer, indented: false);
    private bool _started;

    // One object per line inside the array: the array streams out as tests are judged, and stays valid JSON.
    public void Add(JudgedTrip judged)
    {
        _output.Raw(_started ? ",\n  " : "[\n  ");
        JsonSerializer.Serialize(_output.Json, rows is { } shared ? shared.Of(judged) : Row(judged), VerdictJsonContext.Default.VerdictRow);
        _output.Flush();
        _started = true;
    }

    public void Finish() => _output.Raw(_started ? "\n]\n" : "[]\n");

    internal static VerdictRow Row(JudgedTrip r)
    {
        var m = r.Trip.Measurement;
        var a = r.Assessment;
        var band = a.Band;
        return new VerdictRow(
            m.Tag.Value,
            m.TestedAt.ToString(),
            Format.Stage(m.Stage),
            m.Pole.Code,
            Format.Start(m.Start),
            Format.Measured(m.Current.Value),
            Math.Round(m.Current.Value / r.Device.RatedCurrent.Value, 4),
            m.Outcome.Tripped,
            m.Outcome.Tripped ? Format.Measured(m.Outcome.Time.Value) : null,
            m.Outcome.Tripped ? null : Format.Measured(m.Outcome.Time.Value),
            band.HasRequirement ? Format.Edge(band.Minimum.Limit?.Value) : null,
            band.HasRequirement ? Format.Edge(band.Maximum.Limit?.Value) : null,
            band.HasRequirement ? Format.Source(band.Minimum.Source) : null,
            band.HasRequirement ? Format.Source(band.Maximum.Source) : null,
            Format.Verdict(a.Verdict),
            Format.Basis(a.Basis),
            a.Point?.Label,
            HeldPastTheMaximum(m, band) ? null : a.Margin.DecadesToNearerEdge is { } d ? Math.Round(d, 4) : null,
            a.Margin.PositionInBand is { } p ? Math.Round(p, 4) : null,
            a.Reason,
            r.Envelope.Standard,
            r.Trip.SourceFile,
            r.Trip.SourceLine,
            r.Envelope.ReferenceName,
            Format.Measured(r.Envelope.Reference.Value),
            Math.Round(m.Current.Value / r.Envelope.Reference.Value, 4),
            Domain.Devices.FamilyCodes.Of(r.Device.Family),
            r.Device.Settings.Summary,
            a.Notes,
            band.HasRequirement && band.Minimum.Limit is null,
            r.InstrumentFinding,
            Format.Edge(band.TypicalMinimum?.Limit?.Value),
            Format.Edge(band.TypicalMaximum?.Limit?.Value),
            a.Advisories.Select(x => x.Message).ToList(),
            a.Proved,
            a.Uncertainty?.Time is { } u ? Format.Edge(u.Value) : null,
            a.Uncertainty is { } ui ? Format.Edge(ui.CurrentAmperes) : null,
            Domain.Codes.TextCodes.DecisionRule.Of(a.Uncertainty?.Rule ?? Domain.Verdicts.DecisionRule.Simple),
            a.Uncertainty?.Conformity is { } c ? Domain.Codes.TextCodes.Conformity.Of(c) : null,
            a.Uncertainty?.FromDefaults.Where(d => d is "time" or "current" or "k").ToList() ?? []);
    }

    // A test held without a trip to or past the band's maximum has no known trip time (only a later one), so no margin.
    private static bool HeldPastTheMaximum(Domain.Measurements.TripMeasurement m, Domain.Envelopes.AppliedBand band) =>
        !m.Outcome.Tripped && band.Maximum.Limit is { } max && m.Outcome.Time >= max;

    // A value, not an object: one is made for every test written, a million in a large check, and the JSON writer
    // takes it as it is (the CSV writer boxes it once a row to read its fields).
    internal readonly record struct VerdictRow(
        string AssetTag,
        string TestedAt,
        string Stage,
        string Pole,
        string Start,
        double CurrentA,
        double MultipleOfIn,
        bool Tripped,
        double? TripTimeS,
        double? HeldS,
        double? BandMinS,
        double? BandMaxS,
        string? BandMinSource,
        string? BandMaxSource,
        string Verdict,
        string Basis,
        string? NormativePoint,
        double? MarginDecades,
        double? PositionInBand,
        string Reason,
        string Standard,
        string SourceFile,
        long SourceLine,
        string Reference,
        double ReferenceA,
        double MultipleOfReference,
        string Family,
        string Settings,
        IReadOnlyList<string> Notes,
        bool MustNotTrip,
        string? InstrumentFinding,
        double? TypicalMinS,
        double? TypicalMaxS,
        IReadOnlyList<string> Advisories,
        string? Proved,
        double? UncertaintyS,
        double? UncertaintyA,
        string DecisionRule,
        string? Conformity,
        IReadOnlyList<string> AccuracyDefaults);
}

/// <summary>Serialisation of verdict rows generated at build time: no reflection per row on a million-row check.</summary>
[JsonSourceGenerationOptions(PropertyNamingPolicy = JsonKnownNamingPolicy.SnakeCaseLower, DefaultIgnoreCondition = JsonIgnoreCondition.Never)]
[JsonSerializable(typeof(VerdictJson.VerdictRow))]
internal sealed partial class VerdictJsonContext : JsonSerializerContext;
