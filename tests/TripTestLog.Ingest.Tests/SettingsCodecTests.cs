using System.Text.Json;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>
/// Settings are written by the JSON serializer and read back by a plain reader; these hold the two to the same fields,
/// so a field added to one and not the other fails here rather than reading back as empty.
/// </summary>
public sealed class SettingsCodecTests
{
    public static TheoryData<DeviceSettings> EveryKindOfSettings => new()
    {
        new Iec60898Settings(TripCurve.C),
        new Iec60898Settings(TripCurve.B) { Supply = Supply.Dc },
        new ElectronicTripSettings(Amperes.Of(320), Seconds.Of(12), 6, Amperes.Of(1600), Seconds.Of(0.2), true, Amperes.Of(4000),
            TimeTolerance.Of(0.2, Seconds.Of(0.04)), Seconds.Of(0.05)) { ThermalMemory = true },
        new ElectronicTripSettings(Amperes.Of(100), Seconds.Of(8), 7.2, null, null, false, null, TimeTolerance.Of(0.1, Seconds.Of(0.02)), Seconds.Of(0.08)),
        new ThermalMagneticSettings(Amperes.Of(250), Amperes.Of(2500), Seconds.Of(0.1)),
        new RelaySettings(IdmtCurve.VeryInverse, Amperes.Of(400), 0.15, Amperes.Of(4000), Seconds.Of(0.05), TimeTolerance.Of(0.05, Seconds.Of(0.03)), 0.05,
            Seconds.Of(0.06)),
        new RelaySettings(IdmtCurve.StandardInverse, Amperes.Of(1.5e-1), 1, null, null, TimeTolerance.Of(0.075, Seconds.Of(0.04)), 0.1, Seconds.Of(0)),
        new CurveTableSettings("VENDOR \"X\" 16A"),
    };

    [Theory]
    [MemberData(nameof(EveryKindOfSettings))]
    public void SettingsWrittenAndReadBack_AreTheSameSettings(DeviceSettings settings)
    {
        Assert.Equal(settings, SettingsCodec.Read(SettingsCodec.Write(settings)));
    }

    [Fact]
    public void TheReader_FillsEveryFieldTheSerializerWrites()
    {
        // Every field set to a value of its own, whatever its type, so a name the reader spells differently from the
        // serializer, or a field it does not read, shows up.
        var all = new SettingsCodec.Dto();
        var number = 1.0;
        foreach (var property in typeof(SettingsCodec.Dto).GetProperties())
        {
            property.SetValue(all, property.PropertyType == typeof(double?) ? number += 1.25
                : property.PropertyType == typeof(bool?) ? (object)(property.Name.Length % 2 == 0)
                : property.Name.ToUpperInvariant());
            Assert.NotNull(property.GetValue(all));
        }

        var json = JsonSerializer.Serialize(all, SettingsCodec.SettingsJson.Default.Dto);
        var read = SettingsJsonReader.Read(json);

        foreach (var property in typeof(SettingsCodec.Dto).GetProperties())
        {
            Assert.True(Equals(property.GetValue(all), property.GetValue(read)), $"{property.Name}: wrote {property.GetValue(all)}, read {property.GetValue(read)}");
        }
    }

    [Fact]
    public void TheReader_SkipsNamesItDoesNotKnow_AndTakesNullAsEmpty()
    {
        var read = SettingsJsonReader.Read("""{"kind":"iec60898","later":{"a":[1,2]},"curve":"D","supply":null}""");

        Assert.Equal(("iec60898", "D", (string?)null), (read.Kind, read.Curve, read.Supply));
    }

    [Fact]
    public void TextThatIsNotAnObject_IsRefusedWithTheText()
    {
        var error = Assert.Throws<InvalidDataException>(() => SettingsJsonReader.Read("[1]"));

        Assert.Contains("[1]", error.Message);
    }

    [Theory]
    [InlineData("{\"kind\":\"relay-idmt\",\"tms\":\"0.1\"}")]
    [InlineData("{\"kind\":\"iec60898\",\"curve\":4}")]
    [InlineData("{\"kind\":\"iec60898\",\"curve\":\"C\"")]
    public void AValueOfTheWrongType_OrTextCutShort_IsRefusedAsAStoredValue_WithTheText(string json)
    {
        // A stored value that cannot be read is the person's to mend (the tool says so in one sentence), not a fault.
        var error = Assert.Throws<InvalidDataException>(() => SettingsJsonReader.Read(json));

        Assert.Contains(json, error.Message);
    }
}
