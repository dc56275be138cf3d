using System.Collections.Generic;
using System.Text;
using Phaseward.Netlists;

namespace Phaseward.Checking;

/// <summary>The result of checking a design at run time.</summary>
public sealed class CheckReport
{
    /// <summary>A report of <paramref name="findings"/> on <paramref name="netlist"/>.</summary>
    public CheckReport(Netlist netlist, IReadOnlyList<Finding> findings)
    {
        Netlist = netlist;
        Findings = findings;
    }

    /// <summary>The netlist that was checked.</summary>
    public Netlist Netlist { get; }

    /// <summary>The findings, in rule order, then netlist order.</summary>
    public IReadOnlyList<Finding> Findings { get; }

    /// <summary>True when no rule found anything.</summary>
    public bool IsClean => Findings.Count == 0;

    /// <summary>A human-readable report: a summary line, one line per finding with its location, then the process the
    /// figures came from and the caution that they are estimates.</summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        text.Append("Phaseward: design '").Append(Netlist.DesignName).Append("': ")
            .Append(Count(Netlist.Devices.Count, "device")).Append(", ")
            .Append(Count(Netlist.Nets.Count, "net")).Append(", ")
            .Append(Count(Netlist.Clocks.Count, "clock")).Append(" — ");
        text.AppendLine(IsClean ? "clean, no findings." : Findings.Count + (Findings.Count == 1 ? " finding:" : " findings:"));
        foreach (var finding in Findings)
            text.Append("  ").AppendLine(finding.ToString());
        text.Append("  ").Append(EstimateCaution.ProcessLine(Netlist.Process)).Append(' ').AppendLine(EstimateCaution.Text);
        return text.ToString();
    }

    private static string Count(int count, string noun) => count + " " + noun + (count == 1 ? string.Empty : "s");
}
