using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Application.Text;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Wording;

/// <summary>
/// The words of a finding, made from what its rule found (<see cref="Finding.Facts"/>), in one place for every writer:
/// the command line's text, JSON and CSV and the HTML pages. Numbers are written in the invariant culture.
/// </summary>
public static partial class FindingWords
{
    /// <summary>The standard's requirement or the lab policy the finding rests on.</summary>
    /// <param name="finding">The finding.</param>
    /// <exception cref="ArgumentNullException"><paramref name="finding"/> is null.</exception>
    public static string Basis(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return finding.Facts switch
        {
            GivenWords g => g.Basis,
            TripFacts.OutOfBand f => f.Requirement,
            TripFacts.OutOfBandAt f => f.Requirement,
            TripFacts.WithinUncertainty f => GuardBandBasis(f.Rule, "a result"),
            TripFacts.NotAssessable => "every verdict rests on a requirement: this test neither broke nor proved one",
            TripFacts.SettingsDiffer => "register entry in force on the test date",
            TripFacts.Drift => "lab policy: trip-time drift from the device's first as-found tests at its present settings",
            TripFacts.TrendExit f => $"Theil–Sen trend (Sen 1968) of {f.Tests} as-found tests against {f.Requirement}",
            TripFacts.PeerOutlier => "modified z-score on the median absolute deviation (Iglewicz and Hoaglin 1993)",
            InstrumentFacts.Untraced or InstrumentFacts.SessionUntraced => "lab policy: every measurement is made with an instrument in calibration",
            ContactFacts.WithinUncertainty f => GuardBandBasis(f.Rule, "a reading"),
            ContactFacts.OverLimit => "the maker's contact resistance limit (register contact_limit_uohm)",
            ContactFacts.PoleSpread f => SpreadBasis(f),
            ContactFacts.Rise => "lab policy: contact resistance rise over the pole's first as-found test",
            ContactFacts.LowTestCurrent =>
                "common practice from makers' maintenance guides (lab policy, not a standard): about 10 A under 100 A rating, 100 A at and above",
            ContactFacts.TrendLimit f => $"Theil–Sen trend (Sen 1968) of {f.Tests} as-found tests against the maker's limit",
            InsulationFacts.WithinUncertainty f => GuardBandBasis(f.Rule, "a reading"),
            InsulationFacts.BelowMinimum f => f.Requirement,
            InsulationFacts.TestVoltage f => f.Requirement,
            InsulationFacts.Falling f => $"Theil–Sen trend (Sen 1968) of {f.Readings} as-found readings {Referred(f.Rule)} ({InsulationSetting(f.Rule)})",
            DeviceFacts.Overdue f => OverdueBasis(f),
            _ => throw Unknown(finding.Facts),
        };
    }

    /// <summary>
    /// Plain words a technician can act on. Once an as-left test has confirmed a repair, they keep what was found (the
    /// words up to their last "; ", the action that is now done) and say what stands.
    /// </summary>
    /// <param name="finding">The finding.</param>
    /// <exception cref="ArgumentNullException"><paramref name="finding"/> is null.</exception>
    public static string Message(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        var message = Found(finding.Facts);
        if (finding.Repaired is not { } repair)
        {
            return message;
        }

        var cut = message.LastIndexOf("; ", StringComparison.Ordinal);
        var found = cut < 0 ? message : message[..cut];
        return Invariant($"found on {finding.TestedAt.Date:yyyy-MM-dd}: {found}; repaired: the as-left {What(repair.By)} on {repair.On:yyyy-MM-dd} is good; ")
            + "confirm it at the next as-found test";
    }

    /// <summary>What changed the finding's standing, or null: the later test that closed it, or the as-left test that confirms a repair.</summary>
    /// <param name="finding">The finding.</param>
    /// <exception cref="ArgumentNullException"><paramref name="finding"/> is null.</exception>
    public static string? Standing(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return finding.Settled switch
        {
            null => null,
            { Closes: true } s => Invariant($"closed by the as-found {What(s.By)} on {s.On:yyyy-MM-dd}"),
            var s => Invariant($"as-left {What(s.By)} on {s.On:yyyy-MM-dd} confirms the repair; the next as-found test closes it"),
        };
    }

    /// <summary>What the finding concerns: "pole 1", "path 1-E", "at 2.55 In cold", or "" for the whole device.</summary>
    /// <param name="finding">The finding.</param>
    /// <exception cref="ArgumentNullException"><paramref name="finding"/> is null.</exception>
    public static string Concerns(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return finding.Pole is { } pole ? $"pole {pole}"
            : finding.Path is { } path ? $"path {path}"
            : finding.Point is { } point ? $"at {point}"
            : "";
    }

    private static string Found(FindingFacts facts) => facts switch
    {
        GivenWords g => g.Message,
        TripFacts.OutOfBand f => f.Reason,
        TripFacts.OutOfBandAt f => $"{TextCodes.Stage.Of(f.Stage)} at {f.Point}: {f.Reason}",
        TripFacts.WithinUncertainty f => TripWithinUncertainty(f),
        TripFacts.NotAssessable f => $"{TextCodes.Stage.Of(f.Stage)} at {f.Point} is not assessable: {f.Reason}",
        TripFacts.SettingsDiffer f => $"settings found on the device differ from the register ({string.Join("; ", f.Differences)}); "
            + "review protection coordination, then correct the device or the register",
        TripFacts.Drift f => Drift(f),
        TripFacts.TrendExit f => TrendExit(f),
        TripFacts.PeerOutlier f => PeerOutlier(f),
        InstrumentFacts.Untraced f => f.Trace.Message,
        InstrumentFacts.SessionUntraced f => Invariant($"{TestsOf(f.Tests)} on {f.On:yyyy-MM-dd}: {f.Trace.Message}; confirm the instrument's accuracy or repeat the tests"),
        ContactFacts.WithinUncertainty f => AsLeft(f.Stage, ContactWithinUncertainty(f)),
        ContactFacts.OverLimit f => AsLeft(f.Stage, OverLimit(f)),
        ContactFacts.PoleSpread f => AsLeft(f.Stage, PoleSpread(f)),
        ContactFacts.Rise f => AsLeft(f.Stage, Rise(f)),
        ContactFacts.LowTestCurrent f => LowTestCurrent(f),
        ContactFacts.TrendLimit f => TrendLimit(f),
        InsulationFacts.WithinUncertainty f => InsulationWithinUncertainty(f),
        InsulationFacts.BelowMinimum f => AsLeft(f.Stage, BelowMinimum(f)),
        InsulationFacts.TestVoltage f => AsLeft(f.Stage, TestVoltage(f)),
        InsulationFacts.Falling f => Falling(f),
        DeviceFacts.Overdue f => Overdue(f),
        _ => throw Unknown(facts),
    };

    // The decision rule's basis, for a trip result or a resistance reading (ILAC-G8:09/2019).
    private static string GuardBandBasis(Domain.Verdicts.DecisionRule rule, string what) =>
        $"decision rule {TextCodes.DecisionRule.Of(rule)} (ILAC-G8): {what} within the guard band of its limit is not a confident decision";

    private static string AsLeft(TestStage stage, string message) => stage == TestStage.AsLeft ? "as-left: " + message : message;

    private static string TestsOf(TestKind tests) => tests switch
    {
        TestKind.Trip => "trip tests",
        TestKind.Contact => "contact resistance tests",
        _ => "insulation resistance tests",
    };

    /// <summary>"; N of its M readings come from an instrument not traceable ...", or "" when every reading was traceable.</summary>
    private static string Untraceable(UntraceableShare share) => share.Untraceable == 0 ? ""
        : share.Treatment == UntraceableReadings.Exclude
            ? $"; {Counted.Of(share.Untraceable, "reading")} from an instrument not traceable on the day left out of the trend ({UntraceableSetting(share.Treatment)})"
            : $"; {share.Untraceable} of its {share.Kept} readings {(share.Untraceable == 1 ? "comes" : "come")} from an instrument not traceable on the day "
                + $"(marked on the chart; {UntraceableSetting(share.Treatment)})";

    private static string UntraceableSetting(UntraceableReadings treatment) =>
        PolicyFile.Setting(FindingPolicy.Default with { UntraceableReadings = treatment }, "untraceable_readings");

    /// <summary>
    /// A forecast set against the dates: "STEM and reach it about DATE, before the next test is due (DUE); ACTION", or,
    /// for a date before the day judged on, "STEM and have probably CROSSED since about DATE: test it now".
    /// </summary>
    private static string Forecast(string stem, string crossed, ForecastDates dates, string action)
    {
        if (dates.On < dates.AsOf)
        {
            return Invariant($"{stem} and have probably {crossed} since about {dates.On:yyyy-MM-dd} (judged on {dates.AsOf:yyyy-MM-dd}): test it now");
        }

        return dates.On <= dates.Due
            ? Invariant($"{stem} and reach it about {dates.On:yyyy-MM-dd}, before the next test is due ({dates.Due:yyyy-MM-dd}); {action}")
            : Invariant($"{stem} and reach it about {dates.On:yyyy-MM-dd}, after the next test is due ({dates.Due:yyyy-MM-dd}): confirm the trend then");
    }

    private static InvalidOperationException Unknown(FindingFacts facts) => new($"no words for the facts {facts.GetType().Name}");

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
