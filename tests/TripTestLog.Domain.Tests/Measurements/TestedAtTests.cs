using TripTestLog.Domain.Measurements;

namespace TripTestLog.Domain.Tests.Measurements;

/// <summary>Test dates are ISO 8601 (ISO 8601-1:2019 calendar date and local time forms) and are kept as written.</summary>
public sealed class TestedAtTests
{
    [Theory]
    [InlineData("2024-03-18", "2024-03-18", false)]
    [InlineData("2024-03-18T09:30", "2024-03-18T09:30:00", true)]
    [InlineData("2024-03-18 09:30:15", "2024-03-18T09:30:15", true)]
    [InlineData("2024-03-18T09:30:00+02:00", "2024-03-18T09:30:00+02:00", true)]
    public void IsoForms_AreAccepted_AndWrittenBackInOneForm(string text, string expected, bool hasTime)
    {
        Assert.True(TestedAt.TryParse(text, out var at));
        Assert.Equal(expected, at.ToString());
        Assert.Equal(hasTime, at.HasTime);
    }

    [Fact]
    public void AnOffset_DoesNotShiftTheLocalTime()
    {
        Assert.True(TestedAt.TryParse("2024-03-18T23:30:00-05:00", out var at));

        Assert.Equal(new DateOnly(2024, 3, 18), at.Date);
    }

    [Theory]
    [InlineData("18/03/2024")]
    [InlineData("2024-13-01")]
    [InlineData("yesterday")]
    [InlineData("")]
    public void OtherForms_AreRefused(string text)
    {
        Assert.False(TestedAt.TryParse(text, out _));
    }
}
