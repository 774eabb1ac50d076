using System.Globalization;
using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Output;

/// <summary>`findings --csv`: a header of <see cref="FindingFields"/> names, then one row per finding; text cells neutralised.</summary>
internal sealed class FindingCsv : IFindingWriter
{
    private readonly TextWriter _writer;

    public FindingCsv(TextWriter writer)
    {
        _writer = writer;
        _writer.WriteLine(string.Join(',', FindingFields.All.Select(f => f.Name)));
    }

    public void Add(DeviceCondition device, IReadOnlyList<Finding> findings)
    {
        foreach (var finding in findings)
        {
            _writer.WriteLine(string.Join(',', FindingFields.All.Select(f => f.Value(device, finding) switch
            {
                null => "",
                double number => number.ToString("R", CultureInfo.InvariantCulture),
                var text => CsvCell.Text((string)text),
            })));
        }
    }

    public void Finish()
    {
    }
}
