using Phaseward.Cli.Model;
using Phaseward.Reproducers;

namespace Phaseward.Cli.Reproduction;

/// <summary>A finding's deck, where it was written, and (with --confirm) what ngspice measured.</summary>
internal sealed class ExportedDeck
{
    public ExportedDeck(DesignReport design, ReportedFinding finding, SpiceDeck deck, string path)
    {
        Design = design;
        Finding = finding;
        Deck = deck;
        Path = path;
    }

    public DesignReport Design { get; }

    public ReportedFinding Finding { get; }

    public SpiceDeck Deck { get; }

    /// <summary>Full path of the written deck.</summary>
    public string Path { get; }

    /// <summary>Set by --confirm: the measurements, or null when the deck was not run.</summary>
    public MeasuredValues? Measured { get; set; }

    /// <summary>Set by --confirm when the deck could not be run or measured: why.</summary>
    public string? Problem { get; set; }
}
