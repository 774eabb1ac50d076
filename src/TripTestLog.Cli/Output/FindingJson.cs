using System.Text.Json;
using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Output;

/// <summary>`findings --json`: a JSON array, one object per finding with the fields of <see cref="FindingFields"/>, streamed.</summary>
internal sealed class FindingJson : IFindingWriter, IDisposable
{
    private readonly JsonOutput _output;
    private readonly Utf8JsonWriter _json;

    public FindingJson(TextWriter writer)
    {
        _output = new JsonOutput(writer);
        _json = _output.Json;
        _json.WriteStartArray();
    }

    public void Add(DeviceCondition device, IReadOnlyList<Finding> findings)
    {
        foreach (var finding in findings)
        {
            _json.WriteStartObject();
            foreach (var (name, value) in FindingFields.All)
            {
                switch (value(device, finding))
                {
                    case null:
                        _json.WriteNull(name);
                        break;
                    case double number:
                        _json.WriteNumber(name, number);
                        break;
                    case var text:
                        _json.WriteString(name, (string)text);
                        break;
                }
            }

            _json.WriteEndObject();
        }

        // The JSON goes out device by device: memory holds one device's findings, however large the fleet.
        _output.Flush();
    }

    public void Finish()
    {
        _json.WriteEndArray();
        _output.Raw("\n");
    }

    public void Dispose() => _output.Dispose();
}
