using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Wording;

namespace TripTestLog.Cli.Output;

/// <summary>`findings` for people: each device with its grade and due date, then its findings in plain words, within 100 columns.</summary>
internal sealed class FindingText(TextWriter writer, string asOf, string policyFrom) : IFindingWriter
{
    private int _devices;
    private int _open;
    private int _closed;

    public void Add(DeviceCondition device, IReadOnlyList<Finding> findings)
    {
        if (findings.Count == 0)
        {
            return;
        }

        _devices++;
        var d = device.Device;
        Wrapped.Write(writer, $"{d.Tag} ({d.Site}, {d.Location}): {TextCodes.Grade.Of(device.Grade)}, next test due {device.DueOn:yyyy-MM-dd}", 0);
        foreach (var f in findings)
        {
            if (f.Open)
            {
                _open++;
            }
            else
            {
                _closed++;
            }

            var subject = f.Concerns.Length == 0 ? "" : ", " + f.Concerns;
            var status = f.Open ? TextCodes.Severity.Of(f.Severity) : "closed";
            var since = f.FirstSeen is { } first && first != f.TestedAt.Date ? $", since {first:yyyy-MM-dd}" : "";
            Wrapped.Write(writer, $"[{status}] {TextCodes.FindingKind.Of(f.Kind)}{subject}, tested {f.TestedAt.Date:yyyy-MM-dd}{since}", 2);
            Wrapped.Write(writer, f.Message, 6);
            if (f.Standing is { } standing)
            {
                Wrapped.Write(writer, standing, 6);
            }

            Wrapped.Write(writer, f.Policy is null ? $"basis: {f.Basis}" : $"basis: {f.Basis}; policy: {f.Policy}", 6);
        }

        writer.WriteLine();
    }

    public void Finish()
    {
        var closed = _closed > 0 ? $" and {_closed} closed" : "";
        Wrapped.Write(writer, $"{_open} open findings{closed} on {_devices} {(_devices == 1 ? "device" : "devices")}, as of {asOf}; policy: {policyFrom}.", 0);
        writer.WriteLine();
        Wrapped.Write(writer, Safety.Caution, 0);
    }
}
