using System;
using System.Diagnostics;
using System.IO;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

/// <summary>Runs a deck in ngspice (batch mode) and reads its measurements. ngspice must be on the PATH (.ci/run installs it).</summary>
internal static class Ngspice
{
    public static MeasuredValues Run(SpiceDeck deck)
    {
        var folder = Path.Combine(Path.GetTempPath(), "phaseward-deck-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            var path = Path.Combine(folder, deck.RuleId + ".cir");
            File.WriteAllText(path, deck.Text);
            var start = new ProcessStartInfo("ngspice", "-b " + path)
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
                WorkingDirectory = folder,
            };
            System.Diagnostics.Process process;
            try
            {
                process = System.Diagnostics.Process.Start(start)!;
            }
            catch (System.ComponentModel.Win32Exception e)
            {
                throw new InvalidOperationException("ngspice is not on the PATH (apt-get install ngspice; .ci/run installs it): " + e.Message, e);
            }

            using (process)
            {
                var stderr = process.StandardError.ReadToEndAsync();
                var stdout = process.StandardOutput.ReadToEnd();
                if (!process.WaitForExit(120_000))
                {
                    process.Kill();
                    throw new TimeoutException("ngspice did not finish the " + deck.RuleId + " deck in 120 s.");
                }

                return MeasuredValues.Parse(stdout + "\n" + stderr.Result);
            }
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    /// <summary>The measured value, or a failure that shows the deck (a failed .meas still exits 0).</summary>
    public static double Value(this MeasuredValues values, string name, SpiceDeck deck)
        => values.Find(name) ?? throw new Xunit.Sdk.XunitException($"ngspice printed no value for '{name}' (failed: {string.Join(", ", values.Failed)}). Deck:\n{deck.Text}");
}
