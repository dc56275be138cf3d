using System;
using System.Collections.Generic;
using System.ComponentModel;
using System.Diagnostics;
using System.Globalization;
using System.IO;
using System.Linq;
using Phaseward.Cli.Output;
using Phaseward.Reproducers;

namespace Phaseward.Cli.Reproduction;

/// <summary>
/// --confirm: runs every written deck in ngspice (batch mode) and prints, per finding, each estimate beside the
/// simulated value and their ratio. A missing ngspice or a deck that fails is said plainly, never a crash.
/// </summary>
internal static class DeckConfirmation
{
    public static readonly TimeSpan Timeout = TimeSpan.FromSeconds(120);

    public static void Run(IReadOnlyList<ExportedDeck> decks, TextWriter stdout, string ngspice = "ngspice")
    {
        if (decks.Count == 0)
        {
            stdout.WriteLine("--confirm: no decks to run.");
            return;
        }

        foreach (var deck in decks)
        {
            try
            {
                var output = RunOne(ngspice, deck.Path);
                deck.Measured = MeasuredValues.Parse(output);
                var missing = deck.Deck.Estimates.Where(e => deck.Measured.Find(e.Name) is null).Select(e => e.Name).ToList();
                if (missing.Count > 0)
                    deck.Problem = $"ngspice printed no value for {string.Join(", ", missing)}" + (Error(output) is { } error ? " (" + error + ")" : string.Empty);
            }
            catch (Win32Exception)
            {
                stdout.WriteLine($"--confirm: ngspice is not on the PATH ('{ngspice}' could not be started); the decks were written but not run. Install ngspice (Debian: apt-get install ngspice) to confirm them.");
                return;
            }
            catch (TimeoutException)
            {
                deck.Problem = $"ngspice did not finish in {Timeout.TotalSeconds:0} s";
            }
        }

        var table = new TextTable("deck", "figure", ">estimate", ">simulated", ">simulated/estimate", "note");
        foreach (var deck in decks)
        {
            var name = $"{deck.Design.Name} {Path.GetFileName(deck.Path)}";
            if (deck.Measured is null || deck.Problem is not null && deck.Measured.Values.Count == 0)
            {
                table.Add(name, "-", "-", "-", "-", "failed: " + deck.Problem);
                continue;
            }

            foreach (var estimate in deck.Deck.Estimates)
            {
                var simulated = deck.Measured.Find(estimate.Name);
                table.Add(
                    name, estimate.Name, Format(estimate.Value, estimate.Unit),
                    simulated is { } s ? Format(s, estimate.Unit) : "failed",
                    simulated is { } v ? Ratio(v, estimate.Value) : "-",
                    simulated is null ? deck.Problem ?? string.Empty : string.Empty);
            }
        }

        stdout.WriteLine();
        stdout.WriteLine("Decks run in ngspice (first-order switch-level decks; confirm with transistor-level simulation, the foundry's rules and sign-off):");
        table.Write(stdout);
    }

    /// <summary>The simulated figure of a deck for the page: "t50 = 365 ps (estimate 333 ps, ×1.09)".</summary>
    public static string Summary(ExportedDeck deck)
    {
        if (deck.Measured is null) return deck.Problem is null ? string.Empty : "failed: " + deck.Problem;
        var parts = new List<string>();
        foreach (var estimate in deck.Deck.Estimates)
        {
            var simulated = deck.Measured.Find(estimate.Name);
            parts.Add(simulated is { } s
                ? $"{estimate.Name} = {Format(s, estimate.Unit)} (estimate {Format(estimate.Value, estimate.Unit)}, ×{Ratio(s, estimate.Value)})"
                : $"{estimate.Name}: failed");
        }

        return string.Join("; ", parts);
    }

    private static string RunOne(string ngspice, string deckPath)
    {
        var start = new ProcessStartInfo(ngspice)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            WorkingDirectory = Path.GetDirectoryName(deckPath)!,
        };
        start.ArgumentList.Add("-b");
        start.ArgumentList.Add(deckPath);
        using var process = System.Diagnostics.Process.Start(start)!;
        var stderr = process.StandardError.ReadToEndAsync();
        var stdout = process.StandardOutput.ReadToEndAsync();
        if (!process.WaitForExit((int)Timeout.TotalMilliseconds))
        {
            try { process.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
            throw new TimeoutException();
        }

        return stdout.Result + "\n" + stderr.Result;
    }

    private static string? Error(string output)
        => output.Split('\n').Select(l => l.Trim()).FirstOrDefault(l => l.StartsWith("Error", StringComparison.OrdinalIgnoreCase));

    private static string Format(double value, string unit) => unit.Length == 0 ? value.ToString("0.###", CultureInfo.InvariantCulture) : Engineering.Format(value, unit);

    private static string Ratio(double simulated, double estimate)
        => estimate == 0 ? (simulated == 0 ? "1" : "-") : (simulated / estimate).ToString("0.00", CultureInfo.InvariantCulture);
}
