using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// The decision rules of ILAC-G8:09/2019 (the rule a statement of conformity must name, ISO/IEC 17025:2017, 7.8.6) on
/// worked examples done by hand. Each accuracy ±a is rectangular, u = a / √3
/// (GUM, JCGM 100:2008, 4.3.7); time and current combine through the limit's slope by root-sum-square (GUM 5.1.2);
/// U = k u with k = 2. Limits from IEC 60898-1:2015 Table 7 row c (C16 from cold at 2.55 In = 40.8 A: 1 s &lt; t &lt; 60 s).
/// </summary>
public sealed class DecisionRuleTests
{
    // A timer accurate to ±(0.5 % + 10 ms) and a current taken as exact, so only the time counts.
    private static readonly ResolvedAccuracy TimerOnly = InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01, currentPercent: 0, currentAmperes: 0,
        coverageFactor: 2).Over(InstrumentAccuracy.None);

    // The same timer and a clamp accurate to ±2 %.
    private static readonly ResolvedAccuracy TimerAndClamp = InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01, currentPercent: 2,
        coverageFactor: 2).Over(InstrumentAccuracy.None);

    private static TripAssessment Under(DecisionRule rule, double amps, double seconds, ResolvedAccuracy accuracy, bool held = false)
    {
        var envelope = PointWindowEnvelope.Of(new Iec60898Envelope(TripCurve.C, Amperes.Of(16)));
        var m = new TripMeasurement(AssetTag.Of("U-1"), TestedAt.OnDate(new DateOnly(2025, 5, 6)), TestStage.AsFound, Pole.All, Amperes.Of(amps),
            held ? TripOutcome.HeldFor(Seconds.Of(seconds)) : TripOutcome.TrippedAfter(Seconds.Of(seconds)), StartCondition.Cold, null, "", "", "");
        var conditions = TestConditions.Reference;
        return TripJudge.ApplyRule(TripJudge.Assess(envelope, m, conditions), envelope, conditions, accuracy, rule);
    }

    [Fact]
    public void ATrip_At59_9s_AgainstRowCs60s_WithATimerOfHalfAPerCentPlus10ms()
    {
        // By hand: a = 0.005 x 59.9 + 0.010 = 0.3095 s; u = 0.3095 / √3 = 0.17869 s; U = 2u = 0.35738 s. The trip is 0.1 s
        // inside the limit, less than U.
        var simple = Under(DecisionRule.Simple, 40.8, 59.9, TimerOnly);
        var guarded = Under(DecisionRule.Guarded, 40.8, 59.9, TimerOnly);
        var nonBinary = Under(DecisionRule.NonBinary, 40.8, 59.9, TimerOnly);

        Assert.Equal(Verdict.Pass, simple.Verdict);
        Assert.Equal(0.35738, simple.Uncertainty!.Time!.Value.Value, 4);
        Assert.Null(simple.Uncertainty.Conformity);
        Assert.False(simple.Uncertainty.Conditional);

        Assert.Equal(Verdict.NotAssessable, guarded.Verdict);
        Assert.StartsWith("within the measurement uncertainty of the limit", guarded.Reason);
        Assert.Contains("0.1 s inside the 60 s maximum", guarded.Reason);
        Assert.Contains("U = 0.3574 s", guarded.Reason);
        Assert.Null(guarded.Proved);
        Assert.True(guarded.Uncertainty!.Conditional);

        Assert.Equal(Verdict.Pass, nonBinary.Verdict);
        Assert.Equal(Conformity.ConditionalPass, nonBinary.Uncertainty!.Conformity);
    }

    [Theory]
    // 59.5 s: a = 0.3075, U = 0.35507 s, 0.5 s inside: a pass under every rule.
    [InlineData(59.5, Verdict.Pass, Verdict.Pass, Conformity.Pass)]
    // 60.2 s: a = 0.311, U = 0.35911 s, 0.2 s past: too late as written, within U of the limit.
    [InlineData(60.2, Verdict.TooLate, Verdict.NotAssessable, Conformity.ConditionalFail)]
    // 60.5 s: a = 0.3125, U = 0.36084 s, 0.5 s past: a failure under every rule.
    [InlineData(60.5, Verdict.TooLate, Verdict.TooLate, Conformity.Fail)]
    public void EitherSideOfRowCs60s(double seconds, Verdict simple, Verdict guarded, Conformity statement)
    {
        Assert.Equal(simple, Under(DecisionRule.Simple, 40.8, seconds, TimerOnly).Verdict);
        Assert.Equal(guarded, Under(DecisionRule.Guarded, 40.8, seconds, TimerOnly).Verdict);
        var nb = Under(DecisionRule.NonBinary, 40.8, seconds, TimerOnly);
        Assert.Equal(simple, nb.Verdict);
        Assert.Equal(statement, nb.Uncertainty!.Conformity);
    }

    [Fact]
    public void ACurrentOnePerCentUnderRowC_WithAClampOfTwoPerCent_CarriesTheLimitsSlope()
    {
        // 40.392 A = 2.5245 In, 1 % under row c. Its limit moves by the first-order thermal bound (judging.md):
        // T(M) = 60 s x g(1.45 / M) / g(1.45 / 2.55), g(y) = -ln(1 - y²): T = 60 x 0.400333 / 0.390568 = 61.50 s.
        // dT/dM = 60 / 0.390568 x g'(y) dy/dM, g'(y) = 2y / (1 - y²) = 1.714289, dy/dM = -1.45 / M² = -0.227519:
        // dT/dM = -59.92 s per In, so dT/dI = -3.745 s/A. u(I) = 0.02 x 40.392 / √3 = 0.46641 A: 1.7467 s through the slope.
        // At 58.5 s, u(t) = (0.2925 + 0.01) / √3 = 0.17465 s; u = √(0.17465² + 1.7467²) = 1.7554 s; U = 3.511 s.
        var simple = Under(DecisionRule.Simple, 40.392, 58.5, TimerAndClamp);
        var guarded = Under(DecisionRule.Guarded, 40.392, 58.5, TimerAndClamp);

        Assert.Equal(Verdict.Pass, simple.Verdict);
        Assert.Equal(61.50, simple.Band.Maximum.Limit!.Value.Value, 2);
        Assert.Equal(3.511, simple.Uncertainty!.Time!.Value.Value, 2);
        Assert.Equal(2 * 0.46641, simple.Uncertainty.CurrentAmperes, 4);

        // 3.0 s inside the moved limit, less than U: within the uncertainty. 50 s is 11.5 s inside: a pass.
        Assert.Equal(Verdict.NotAssessable, guarded.Verdict);
        Assert.Equal(Verdict.Pass, Under(DecisionRule.Guarded, 40.392, 50, TimerAndClamp).Verdict);
    }

    [Fact]
    public void ACurrentJustOutsideThePointWindow_IsInsideItOnceTheClampsUncertaintyWidensIt()
    {
        // 39.35 A = 2.459 In, 3.6 % under row c, outside the ±3 % window: a 62 s trip breaks nothing and proves nothing.
        // With a ±2 % clamp (U(I) = 2.31 % of the reading) the test may have been within 3 % of row c, where its moved
        // limit (g(0.58958) / g(0.56863) = 0.42710 / 0.39057 = x1.0935, 65.6 s at 2.459 In) holds: simple says not assessable; guarded also, and says why.
        var simple = Under(DecisionRule.Simple, 39.35, 62, TimerAndClamp);
        var guarded = Under(DecisionRule.Guarded, 39.35, 62, TimerAndClamp);

        Assert.Equal(Verdict.NotAssessable, simple.Verdict);
        Assert.Equal(Verdict.NotAssessable, guarded.Verdict);

        // A trip of 30 s there proves row c a fortiori at any current within the clamp's uncertainty: a pass under guarded too.
        Assert.Equal(Verdict.Pass, Under(DecisionRule.Guarded, 39.35, 30, TimerAndClamp).Verdict);
    }

    [Fact]
    public void TheWorksheetsGuardedWindow_IsWhereTheCheckPassesUnderGuarded()
    {
        // Row c at 40.8 A with the timer alone, w = U at each limit (ILAC-G8:09/2019, guarded acceptance):
        // at 60 s, U = 2 x (0.005 x 60 + 0.010) / √3 = 0.35796 s; at 1 s, U = 2 x (0.005 x 1 + 0.010) / √3 = 0.017321 s.
        var envelope = PointWindowEnvelope.Of(new Iec60898Envelope(TripCurve.C, Amperes.Of(16)));
        var window = envelope.At(Amperes.Of(40.8)).For(TestConditions.Reference);
        var g = TripJudge.GuardedWindowOf(envelope, Amperes.Of(40.8), TestConditions.Reference, window, TimerOnly);

        Assert.Equal(60 - 0.35796, g.Maximum!.Value.Value, 4);
        Assert.Equal(1 + 0.017321, g.Minimum!.Value.Value, 5);
        Assert.False(g.Closed);

        // Just inside the guarded window the check passes under guarded; just outside it, it withholds the verdict.
        Assert.Equal(Verdict.Pass, Under(DecisionRule.Guarded, 40.8, g.Maximum.Value.Value - 0.01, TimerOnly).Verdict);
        Assert.Equal(Verdict.NotAssessable, Under(DecisionRule.Guarded, 40.8, g.Maximum.Value.Value + 0.01, TimerOnly).Verdict);
        Assert.Equal(Verdict.Pass, Under(DecisionRule.Guarded, 40.8, g.Minimum.Value.Value + 0.001, TimerOnly).Verdict);
        Assert.Equal(Verdict.NotAssessable, Under(DecisionRule.Guarded, 40.8, g.Minimum.Value.Value - 0.001, TimerOnly).Verdict);
    }

    [Fact]
    public void TheWorksheetsGuardBand_CarriesTheCurrentsShareAsTheCheckDoes()
    {
        // With a ±2 % clamp the limit's slope adds the current's share (GUM, JCGM 100:2008, 5.1.2); a trip at the limit
        // itself is judged with the same U the worksheet moves the limit by.
        var envelope = PointWindowEnvelope.Of(new Iec60898Envelope(TripCurve.C, Amperes.Of(16)));
        var window = envelope.At(Amperes.Of(40.8)).For(TestConditions.Reference);
        var g = TripJudge.GuardedWindowOf(envelope, Amperes.Of(40.8), TestConditions.Reference, window, TimerAndClamp);
        var atLimit = Under(DecisionRule.Simple, 40.8, 60, TimerAndClamp);

        Assert.Equal(atLimit.Uncertainty!.Time!.Value.Value, g.MaximumBand!.Value, 6);
        Assert.True(g.MaximumBand > 0.35796 * 2, "the current's share through the slope is missing");
    }

    [Theory]
    [InlineData(3600.0, Verdict.NotAssessable, Conformity.ConditionalPass)]
    [InlineData(3620.0, Verdict.NotAssessable, Conformity.ConditionalPass)]
    [InlineData(3621.0, Verdict.Pass, Conformity.Pass)]
    public void AHoldOfRowAsHour_MustOutlastItByTheGuardBand(double seconds, Verdict guarded, Conformity statement)
    {
        // IEC 60898-1 Table 7 row a: 1.13 In (18.08 A for a C16) from cold, no trip within 1 h. The hold is timed by the
        // same set: at 3600 s, a = 0.005 x 3600 + 0.010 = 18.01 s; u = 18.01 / √3 = 10.398 s; U = 20.796 s (20.912 s at
        // 3620 s, 20.917 s at 3621 s). A hold of 3600 s proves the hour as written (simple), not past the guard band;
        // 3620 s is 20 s past the hour, inside its 20.912 s; 3621 s is 21 s past, outside its 20.917 s.
        var simple = Under(DecisionRule.Simple, 18.08, seconds, TimerOnly, held: true);
        Assert.Equal(Verdict.Pass, simple.Verdict);
        Assert.Equal(2 * ((0.005 * seconds) + 0.010) / Math.Sqrt(3), simple.Uncertainty!.Time!.Value.Value, 3);

        var underGuard = Under(DecisionRule.Guarded, 18.08, seconds, TimerOnly, held: true);
        Assert.Equal(guarded, underGuard.Verdict);
        Assert.Equal(statement, Under(DecisionRule.NonBinary, 18.08, seconds, TimerOnly, held: true).Uncertainty!.Conformity);
        if (guarded == Verdict.NotAssessable)
        {
            Assert.Contains("within the measurement uncertainty of the limit", underGuard.Reason);
        }
    }

    [Fact]
    public void TheWorksheetsGuardedHold_IsTheShortestHoldTheCheckPassesUnderGuarded()
    {
        // held = 3600 + 2 (0.005 held + 0.010) / √3: held (1 - 0.0057735) = 3600.01155, held = 3620.917 s by hand.
        var hold = TripJudge.GuardedHold(Seconds.Of(3600), TimerOnly);
        Assert.Equal(3620.917, hold.Value, 3);
        Assert.Equal(Verdict.Pass, Under(DecisionRule.Guarded, 18.08, Math.Ceiling(hold.Value), TimerOnly, held: true).Verdict);
        Assert.Equal(Verdict.NotAssessable, Under(DecisionRule.Guarded, 18.08, Math.Floor(hold.Value), TimerOnly, held: true).Verdict);
    }

    [Fact]
    public void TheRulesAndStatementsHaveOneCodeEach()
    {
        Assert.Equal(["simple", "guarded", "non-binary"], TextCodes.DecisionRule.All);
        Assert.Equal(["pass", "conditional-pass", "conditional-fail", "fail"], TextCodes.Conformity.All);
        Assert.Equal("retest-accuracy", TextCodes.FindingKind.Of(FindingKind.RetestAccuracy));
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(-0.1)]
    [InlineData(100.1)]
    public void AnAccuracyOutsideItsRange_IsRefused(double percent)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => InstrumentAccuracy.Of(timePercent: percent));
        Assert.Equal("timePercent", e.ParamName);
    }

    [Fact]
    public void WhatTheRegisterLeavesOut_ComesFromTheDefaults_AndSaysSo()
    {
        var stated = InstrumentAccuracy.Of(timePercent: 0.1);
        var resolved = stated.Over(InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01, currentPercent: 2, coverageFactor: 2));

        // The time is stated (its fixed part then zero); the current and k come from the defaults.
        Assert.Equal(0.1, resolved.TimePercent);
        Assert.Equal(0, resolved.TimeSeconds);
        Assert.Equal(2, resolved.CurrentPercent);
        Assert.Equal(["current", "resistance", "insulation", "k"], resolved.FromDefaults);
        Assert.Contains("current from the lab policy's defaults", resolved.Words(true, true, false, false));
    }

    [Fact]
    public void TheWordsSayEachAccuracysOwnFiguresAndDefaults_WhateverWasWordedBefore()
    {
        // Words are kept by what they say, so two accuracies alike in figures but not in what came from the defaults, or
        // asked for other quantities, must not share them (the tool's own wording; GUM 4.3.7 behind the figures).
        var defaults = InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01, currentPercent: 2, coverageFactor: 2);
        var fromRegister = InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01, currentPercent: 2, coverageFactor: 2).Over(defaults);
        var fromDefaults = InstrumentAccuracy.None.Over(defaults);
        var timeOnly = InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01).Over(defaults);

        var words = new[]
        {
            fromRegister.Words(true, true, false, false), fromDefaults.Words(true, true, false, false), timeOnly.Words(true, true, false, false),
            fromDefaults.Words(true, false, false, false), fromRegister.Words(true, false, false, false), fromRegister.Words(true, true, false, false),
        };

        Assert.Equal("time ±(0.5 % + 0.01 s), current ±2 %, k = 2", words[0]);
        Assert.Equal("time ±(0.5 % + 0.01 s), current ±2 %, k = 2; time and current from the lab policy's defaults (not in the instrument register)", words[1]);
        Assert.Equal("time ±(0.5 % + 0.01 s), current ±2 %, k = 2; current from the lab policy's defaults (not in the instrument register)", words[2]);
        Assert.Equal("time ±(0.5 % + 0.01 s), k = 2; time from the lab policy's defaults (not in the instrument register)", words[3]);
        Assert.Equal("time ±(0.5 % + 0.01 s), k = 2", words[4]);
        Assert.Equal(words[0], words[5]);
    }
}
