using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Quantities;

/// <summary>Every quantity rejects NaN, infinities and out-of-range values with the parameter's name.</summary>
public sealed class QuantityFactoryTests
{
    public static TheoryData<string, Action> Rejected => new()
    {
        { "amperes", () => Amperes.Of(double.NaN) },
        { "amperes", () => Amperes.Of(0) },
        { "amperes", () => Amperes.Of(double.PositiveInfinity) },
        { "seconds", () => Seconds.Of(-1) },
        { "seconds", () => Seconds.Of(double.NaN) },
        { "microOhms", () => MicroOhms.Of(-5) },
        { "megaOhms", () => MegaOhms.Of(double.NegativeInfinity) },
        { "volts", () => Volts.Of(0) },
        { "celsius", () => Celsius.Of(400) },
        { "multiple", () => CurrentMultiple.Of(double.NaN) },
    };

    [Theory]
    [MemberData(nameof(Rejected))]
    public void BadValues_ThrowOutOfRange_NamingTheParameter(string parameter, Action create)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(create);

        Assert.Equal(parameter, e.ParamName);
    }

    [Fact]
    public void ZeroSeconds_IsAllowed_ForAnOpenMinimumEdge()
    {
        Assert.Equal(0, Seconds.Of(0).Value);
    }

    [Fact]
    public void CurrentOverReference_IsAMultiple()
    {
        Assert.Equal(2.55, (Amperes.Of(40.8) / Amperes.Of(16)).Value, 1e-12);
    }
}
