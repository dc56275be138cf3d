using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text;
using Phaseward.Cli.Model;
using Phaseward.Reproducers;

namespace Phaseward.Cli.Reproduction;

/// <summary>
/// --spice: one deck per finding, <c>DIR/Design/RuleId-n.cir</c>. Every deck is made before anything is written;
/// a write that fails removes what this run wrote, so a failure leaves no partial set behind.
/// </summary>
internal static class DeckExport
{
    public static IReadOnlyList<ExportedDeck> Write(string directory, IReadOnlyList<DesignReport> reports, TextWriter log)
    {
        var root = Path.GetFullPath(directory);
        var planned = new List<ExportedDeck>();
        foreach (var report in reports)
        {
            var counts = new Dictionary<string, int>(StringComparer.Ordinal);
            foreach (var finding in report.Findings)
            {
                if (!Reproducer.Supports(finding.RuleId))
                {
                    log.WriteLine($"No deck for {finding.RuleId} at {finding.Location}: the rule has no electrical figures to reproduce.");
                    continue;
                }

                SpiceDeck deck;
                try
                {
                    deck = Reproducer.Deck(finding.Finding, report.Netlist);
                }
                catch (ArgumentException e)
                {
                    throw new InputException($"cannot write the deck of the {finding.RuleId} finding at {finding.Location} in design '{report.Name}': {e.Message}");
                }

                counts.TryGetValue(finding.RuleId, out var n);
                counts[finding.RuleId] = ++n;
                var path = Path.Combine(root, FileName(report.Name), finding.RuleId + "-" + n.ToString(System.Globalization.CultureInfo.InvariantCulture) + ".cir");
                planned.Add(new ExportedDeck(report, finding, deck, path));
            }
        }

        var createdFolders = new List<string>();
        var written = new List<string>();
        try
        {
            foreach (var folder in planned.Select(d => Path.GetDirectoryName(d.Path)!).Prepend(root).Distinct())
            {
                if (Directory.Exists(folder)) continue;
                Directory.CreateDirectory(folder);
                createdFolders.Add(folder);
            }

            foreach (var deck in planned)
            {
                var temp = deck.Path + "." + Guid.NewGuid().ToString("N").Substring(0, 8) + ".tmp";
                File.WriteAllText(temp, deck.Deck.Text, new UTF8Encoding(false));
                File.Move(temp, deck.Path, overwrite: true);
                written.Add(deck.Path);
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            foreach (var file in written) TryDelete(() => File.Delete(file));
            foreach (var folder in Enumerable.Reverse(createdFolders)) TryDelete(() => Directory.Delete(folder, recursive: true));
            throw new InputException($"cannot write SPICE decks to '{directory}': {e.Message} (nothing was written)");
        }

        return planned;
    }

    /// <summary>A design name as a folder name: characters a file system refuses become '_'.</summary>
    public static string FileName(string name)
    {
        var invalid = Path.GetInvalidFileNameChars();
        var text = new StringBuilder(name.Length);
        foreach (var c in name)
            text.Append(Array.IndexOf(invalid, c) >= 0 || c is '/' or '\\' or ':' ? '_' : c);
        var result = text.ToString().Trim('.', ' ');
        return result.Length == 0 ? "_" : result;
    }

    private static void TryDelete(Action delete)
    {
        try
        {
            delete();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Best effort: the error that stopped the export is what the user is told.
        }
    }
}
