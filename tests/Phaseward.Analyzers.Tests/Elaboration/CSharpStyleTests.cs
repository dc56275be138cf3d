using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Tests.Robustness;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Designs written the way C# programmers write code (CSharpStyles/*.cs: blocks and hierarchy, user classes and
/// records, lambdas, LINQ, collections, strings, patterns, exceptions...). Each hides a hazard, named by a
/// <c>// expect: PWxxxx</c> line above the design. For every design: the analyzers report that hazard inside the design
/// and no PW9001/PW9002/PW9003 there; the compile-time netlist equals the run-time one, names and lines included.
/// </summary>
public class CSharpStyleTests
{
    private static readonly string Folder = Repository.PathOf("tests", "Phaseward.Analyzers.Tests", "Elaboration", "CSharpStyles");

    private static readonly Lazy<InMemoryDesigns> Designs = new(() =>
        InMemoryDesigns.FromFiles(Directory.GetFiles(Folder, "*.cs").OrderBy(p => p, StringComparer.Ordinal).ToArray()));

    private static readonly Lazy<ImmutableArray<Diagnostic>> Diagnostics = new(() =>
        Designs.Value.Compilation.WithAnalyzers(BoundedAnalysis.Analyzers)
            .GetAnalyzerDiagnosticsAsync(CancellationToken.None).GetAwaiter().GetResult());

    private static readonly Regex Expectation = new(@"// expect: (?<ids>PW\d{4}(, PW\d{4})*)\s*\n\s*public (sealed )?class (?<name>\w+) : Design", RegexOptions.Compiled);

    /// <summary>Every design of the folder with the rules it must show (read from the sources, so none is left out).</summary>
    public static TheoryData<string, string> Expected()
    {
        var data = new TheoryData<string, string>();
        foreach (var file in Directory.GetFiles(Folder, "*.cs").OrderBy(p => p, StringComparer.Ordinal))
            foreach (Match match in Expectation.Matches(File.ReadAllText(file).Replace("\r\n", "\n")))
                data.Add(match.Groups["name"].Value, match.Groups["ids"].Value);
        return data;
    }

    [Theory]
    [MemberData(nameof(Expected))]
    public void HazardIsFoundWithoutPW9001AndNetlistsAgree(string design, string expectedIds)
    {
        var compileTime = Designs.Value.CompileTime("CSharpStyles." + design);
        Assert.True(compileTime.Issues.Count == 0, design + ": " + string.Join("\n", compileTime.Issues));
        var findings = Checker.Check(compileTime.Netlist!).Findings;
        foreach (var id in expectedIds.Split(", "))
            Assert.True(findings.Any(f => f.RuleId == id), $"{design}: no {id}; found {string.Join("; ", findings)}");

        ParityTests.AssertParity(Designs.Value, "CSharpStyles." + design);
    }

    /// <summary>The same through the analyzers, as the compiler runs them: every expected rule is reported, nothing from PW9xxx.</summary>
    [Fact]
    public void TheAnalyzersReportTheHazardsAndNoElaborationGap()
    {
        var elaboration = Diagnostics.Value.Where(d => d.Id.StartsWith("PW9", StringComparison.Ordinal)).ToList();
        Assert.True(elaboration.Count == 0, string.Join("\n", elaboration));
        foreach (var id in Expected().SelectMany(row => ((string)row[1]).Split(", ")).Distinct())
            Assert.Contains(Diagnostics.Value, d => d.Id == id);
    }

    [Fact]
    public void EveryDesignInTheFolderStatesItsHazard()
    {
        var declared = Designs.Value.DesignNames.Select(n => n.Substring("CSharpStyles.".Length)).OrderBy(n => n, StringComparer.Ordinal);
        var expected = Expected().Select(row => (string)row[0]).OrderBy(n => n, StringComparer.Ordinal);
        Assert.Equal(declared, expected);
    }
}
