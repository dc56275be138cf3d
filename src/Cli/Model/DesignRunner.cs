using System;
using System.Diagnostics;
using System.IO;
using System.Reflection;
using Phaseward.Checking;
using Phaseward.Cli.Policy;
using Phaseward.Netlists;

namespace Phaseward.Cli.Model;

/// <summary>Elaborates and checks one design; an exception from the design's own code becomes a clear input error.</summary>
internal static class DesignRunner
{
    public static DesignReport Run(Design design, string assemblyPath, RulePolicy policy, SeverityPolicy severities)
    {
        var type = design.GetType();
        Netlist netlist;
        string name;
        try
        {
            name = design.Name;
            netlist = design.Elaborate();
        }
        catch (Exception e)
        {
            throw new InputException($"design '{type.FullName}' in '{assemblyPath}' throws while it is elaborated: "
                + $"{e.GetType().Name}: {e.Message}{WhereThrown(e, type.Assembly)}");
        }

        var check = Checker.Check(netlist, policy);
        return new DesignReport(design, netlist, check, policy, severities);
    }

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
