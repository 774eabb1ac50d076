using System.Text.Encodings.Web;
using System.Text.Json;
using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Output;

/// <summary>`findings --json`: a JSON array, one object per finding with the fields of <see cref="FindingFields"/>, streamed.</summary>
internal sealed class FindingJson : IFindingWriter, IDisposable
{
    private readonly Utf8JsonWriter _json;
    private readonly Stream _stream;
    private readonly TextWriter _writer;

    public FindingJson(TextWriter writer)
    {
        _writer = writer;
        _stream = new MemoryStream();
        _json = new Utf8JsonWriter(_stream, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
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

        Flush();
    }

    public void Finish()
    {
        _json.WriteEndArray();
        Flush();
        _writer.WriteLine();
    }

    // The JSON goes out device by device: memory holds one device's findings, however large the fleet.
    private void Flush()
    {
        _json.Flush();
        if (_stream.Length > 0)
        {
            _writer.Write(System.Text.Encoding.UTF8.GetString(((MemoryStream)_stream).GetBuffer(), 0, (int)_stream.Length));
            _stream.SetLength(0);
        }
    }

    public void Dispose()
    {
        _json.Dispose();
        _stream.Dispose();
    }
}
