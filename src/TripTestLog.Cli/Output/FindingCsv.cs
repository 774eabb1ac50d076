using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Output;

/// <summary>`findings --csv`: a header of <see cref="FindingFields"/> names, then one row per finding; text cells neutralised.</summary>
internal sealed class FindingCsv : IFindingWriter
{
    private readonly CsvOutput _csv;

    public FindingCsv(TextWriter writer)
    {
        _csv = new CsvOutput(writer);
        _csv.Header(FindingFields.All.Select(f => f.Name));
    }

    public void Add(DeviceCondition device, IReadOnlyList<Finding> findings)
    {
        foreach (var finding in findings)
        {
            foreach (var (_, value) in FindingFields.All)
            {
                _csv.Cell(value(device, finding));
            }

            _csv.EndRow();
        }
    }

    public void Finish()
    {
    }
}
