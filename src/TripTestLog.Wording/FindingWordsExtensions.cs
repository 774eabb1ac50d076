using TripTestLog.Application.Findings;

namespace TripTestLog.Wording;

/// <summary>A finding's words as members of it, for the writers that show findings; each is made by <see cref="FindingWords"/>.</summary>
public static class FindingWordsExtensions
{
    extension(Finding finding)
    {
        /// <summary>The standard's requirement or the lab policy it comes from (<see cref="FindingWords.Basis"/>).</summary>
        public string Basis => FindingWords.Basis(finding);

        /// <summary>Plain words a technician can act on (<see cref="FindingWords.Message"/>).</summary>
        public string Message => FindingWords.Message(finding);

        /// <summary>What changed its standing, or null (<see cref="FindingWords.Standing"/>).</summary>
        public string? Standing => FindingWords.Standing(finding);

        /// <summary>What it concerns: "pole 1", "path 1-E", "at 2.55 In cold", or "" (<see cref="FindingWords.Concerns"/>).</summary>
        public string Concerns => FindingWords.Concerns(finding);
    }
}
