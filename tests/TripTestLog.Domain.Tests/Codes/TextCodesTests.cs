using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Domain.Tests.Codes;

/// <summary>Every text code is spelled once; a person's spelling is read kindly, a stored one strictly.</summary>
public sealed class TextCodesTests
{
    [Theory]
    [InlineData("as-found", TestStage.AsFound)]
    [InlineData(" AS-LEFT ", TestStage.AsLeft)]
    public void AWrittenStage_IsReadWhateverItsCase(string text, TestStage expected)
    {
        Assert.True(TextCodes.Stage.TryParse(text, out var stage));
        Assert.Equal(expected, stage);
    }

    [Theory]
    [InlineData("As-Found")]
    [InlineData("AsFound")]
    [InlineData("as-left ")]
    [InlineData("")]
    public void AStoredStageThatIsNotExactlyACode_FailsLoudly(string stored)
    {
        var e = Assert.Throws<InvalidDataException>(() => TextCodes.Stage.Decode(stored));
        Assert.Contains($"'{stored}'", e.Message);
    }

    [Fact]
    public void EveryEnumMember_HasOneCode_AndDecodesBack()
    {
        foreach (var stage in Enum.GetValues<TestStage>())
        {
            Assert.Equal(stage, TextCodes.Stage.Decode(TextCodes.Stage.Of(stage)));
        }

        foreach (var start in Enum.GetValues<StartCondition>())
        {
            Assert.Equal(start, TextCodes.Start.Decode(TextCodes.Start.Of(start)));
        }

        foreach (var family in Enum.GetValues<Devices.DeviceFamily>())
        {
            Assert.Equal(family, TextCodes.Family.Decode(TextCodes.Family.Of(family)));
        }
    }

    [Fact]
    public void ABookMissingAMember_IsRefusedWhenBuilt()
    {
        Assert.Throws<ArgumentException>(() => new CodeBook<StartCondition>("start", (StartCondition.Cold, "cold")));
    }

    [Fact]
    public void Choices_ListTheCodesForMessages()
    {
        Assert.Equal("cold or warm", TextCodes.Start.Choices);
    }
}
