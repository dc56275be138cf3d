using System;
using System.Diagnostics;
using System.Linq;
using System.Reflection;
using Phaseward.Checking;
using Phaseward.Cli.Policy;
using Phaseward.Netlists;

namespace Phaseward.Cli.Model;

/// <summary>Elaborates and checks one design; an exception from the design's own code becomes a clear input error.</summary>
internal static class DesignRunner
{
    /// <summary>Runs the design's <c>Describe</c>.</summary>
    public static Netlist Elaborate(Design design, string assemblyPath)
    {
        var type = design.GetType();
        try
        {
            _ = design.Name;
            return design.Elaborate();
        }
        catch (Exception e)
        {
            throw new InputException($"design '{type.FullName}' in '{assemblyPath}' throws while it is elaborated: "
                + $"{e.GetType().Name}: {e.Message}{WhereThrown(e, type.Assembly)}");
        }
    }

    /// <summary>
    /// Checks an elaborated design as the analyzers would: its <c>phaseward.</c> options from the configuration of the
    /// file holding its <c>Describe</c> (<paramref name="anchor"/>; a value that cannot be used is a PW9004 finding
    /// there and its default applies), each finding at the severity configured for its own file. As in the build, a
    /// file's option problems are reported once, with the first of its designs (<paramref name="reportOptionProblems"/>).
    /// </summary>
    public static DesignReport Check(Design design, Netlist netlist, SourceSpan anchor, ReportPolicy policy, bool reportOptionProblems = true)
    {
        var (rulePolicy, problems) = policy.RulePolicyFor(anchor.Path);
        var check = Checker.Check(netlist, rulePolicy);
        var optionFindings = problems.Where(_ => reportOptionProblems).Select(p => new Finding(RuleCatalog.InvalidOption, anchor, new object[] { p.Key, p.Value, p.Expected, p.DefaultValue }));
        var findings = new CheckReport(netlist, optionFindings.Concat(check.Findings).ToList());
        return new DesignReport(design, netlist, findings, rulePolicy,
            f => policy.SeverityOf(f.Rule, f.Location.Path.Length > 0 ? f.Location.Path : anchor.Path));
    }

    /// <summary>
    /// Where the design's <c>Describe</c> is: from the assembly's symbols, else the file most of its devices were
    /// written in (run-time spans carry the compile-time path of each DSL call).
    /// </summary>
    public static SourceSpan Anchor(Design design, Netlist netlist, Loading.DesignSources sources)
        => sources.DescribeOf(design.GetType())
           ?? netlist.Devices.Where(d => d.Span.IsKnown).GroupBy(d => d.Span.Path, StringComparer.Ordinal)
               .OrderByDescending(g => g.Count()).ThenBy(g => g.Key, StringComparer.Ordinal)
               .Select(g => new SourceSpan(g.Key, g.Min(d => d.Span.Line))).FirstOrDefault()
           ?? SourceSpan.Unknown;

    /// <summary>" (at File.cs:12)": the innermost frame of the design's assembly with a source line, when symbols are there.</summary>
    public static string WhereThrown(Exception e, Assembly designAssembly)
    {
        foreach (var frame in new StackTrace(e, fNeedFileInfo: true).GetFrames())
        {
            if (frame.GetMethod()?.DeclaringType?.Assembly != designAssembly || frame.GetFileName() is not { } file)
                continue;
            return $" (at {file}:{frame.GetFileLineNumber()})";
        }

        return string.Empty;
    }
}
