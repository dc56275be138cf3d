using System;
using System.IO;
using System.Linq;
using Phaseward.Checking;
using Phaseward.EndToEnd.Tests.Packaging;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// Severities (<c>dotnet_diagnostic.PWxxxx.severity</c>) and Phaseward's own <c>phaseward.</c> options, read from an
/// .editorconfig beside a fresh design project, change what a real build reports; so does a <c>#pragma</c> in the
/// source. The unchanged project's build (<see cref="PackagedPhaseward.Baseline"/>) is the control.
/// </summary>
[Collection(PackagedPhasewardCollection.Name)]
public sealed class EditorConfigTests
{
    private readonly PackagedPhaseward package;

    public EditorConfigTests(PackagedPhaseward package) => this.package = package;

    [Fact]
    public void SeveritiesAndOptionsFromEditorConfigChangeWhatIsReported()
    {
        var project = package.CreateDesignProject("editorconfig");
        // A second six-gate route, to show that the limit is read as a number: 10 lets six gates pass, 5 does not.
        File.WriteAllText(Path.Combine(project, "CellarRoute.cs"),
            FrostlineDesigns.SprinklerRoute.Source.Replace("SprinklerRoute", "CellarRoute", StringComparison.Ordinal));
        // And a third, whose hazard the designer suppressed in the source: the build stays quiet about it, and the SARIF
        // log keeps it as a suppressed result.
        var vent = FrostlineDesigns.SprinklerRoute.Source.Replace("SprinklerRoute", "VentRoute", StringComparison.Ordinal)
            .Replace("            for (var valve", "#pragma warning disable PW2001 // buffered at the vent manifold\n            for (var valve", StringComparison.Ordinal)
            .Replace("            c.Output(", "#pragma warning restore PW2001\n            c.Output(", StringComparison.Ordinal);
        Assert.Equal(2, vent.Split("#pragma").Length - 1);
        File.WriteAllText(Path.Combine(project, "VentRoute.cs"), vent);
        File.WriteAllText(Path.Combine(project, ".editorconfig"), """
            [*.cs]
            dotnet_diagnostic.PW1001.severity = none
            dotnet_diagnostic.PW3001.severity = error
            phaseward.max_series_pass_gates = 10

            [{CellarRoute,VentRoute}.cs]
            phaseward.max_series_pass_gates = 5

            [HeaterHold.cs]
            phaseward.min_timing_slack = soon

            """);

        var build = package.Build(project, "editorconfig");
        var messages = build.PhasewardMessages;

        // Control: the same designs without the .editorconfig report PW1001 and PW2001 as warnings.
        Assert.Contains(package.Baseline.PhasewardMessages, m => m.Id == RuleCatalog.SameWindowLatches.Id && m.Severity == "warning");
        Assert.Contains(package.Baseline.PhasewardMessages, m => m.Id == RuleCatalog.SeriesPassGates.Id && m.Severity == "warning");

        // severity = none: gone.
        Assert.DoesNotContain(messages, m => m.Id == RuleCatalog.SameWindowLatches.Id);
        // severity = error: an error at the same place, and the build fails.
        var (line, column) = FrostlineDesigns.HeaterHold.ExpectedPosition;
        var error = Assert.Single(messages, m => m.Id == RuleCatalog.DynamicNodeOnGatedClock.Id);
        Assert.Equal(("error", FrostlineDesigns.HeaterHold.FileName, line, column), (error.Severity, Path.GetFileName(error.File), error.Line, error.Column));
        Assert.True(build.ExitCode != 0, build.Output);

        // phaseward.max_series_pass_gates: 10 allows SprinklerRoute's six gates, 5 does not allow CellarRoute's.
        var passGates = Assert.Single(messages, m => m.Id == RuleCatalog.SeriesPassGates.Id);
        Assert.Equal("CellarRoute.cs", Path.GetFileName(passGates.File));
        Assert.StartsWith("6 pass gates in series without a restoring stage (limit 5)", passGates.Message, StringComparison.Ordinal);

        // An invalid value: PW9004 names the key and the value, in the file the key applies to.
        var invalid = Assert.Single(messages, m => m.Id == RuleCatalog.InvalidOption.Id);
        Assert.Equal(("warning", FrostlineDesigns.HeaterHold.FileName), (invalid.Severity, Path.GetFileName(invalid.File)));
        Assert.Contains("'phaseward.min_timing_slack'", invalid.Message, StringComparison.Ordinal);
        Assert.Contains("'soon'", invalid.Message, StringComparison.Ordinal);

        // The suppressed one: absent from the console, present in the SARIF log as suppressed in source.
        var (_, results, _) = SarifLog.Read(build.SarifPath);
        var suppressed = Assert.Single(results, r => r.IsPhaseward && r.Suppressed);
        Assert.Equal((RuleCatalog.SeriesPassGates.Id, "VentRoute.cs"), (suppressed.RuleId, suppressed.FileName));
        Assert.DoesNotContain(messages, m => m.File.EndsWith("VentRoute.cs", StringComparison.Ordinal));

        Assert.Equal(new[] { RuleCatalog.SeriesPassGates.Id, RuleCatalog.DynamicNodeOnGatedClock.Id, RuleCatalog.InvalidOption.Id }.Order(StringComparer.Ordinal),
            messages.Select(m => m.Id).Order(StringComparer.Ordinal));
    }
}
