using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Cli.Model;
using Phaseward.Cli.Policy;
using Phaseward.Clocking;
using Phaseward.Netlists;
using Phaseward.Sequencing;

namespace Phaseward.Cli.Output;

/// <summary>Short texts shared by the text and HTML outputs, so both say the same thing.</summary>
internal static class Describe
{
    public const string Caution = EstimateCaution.Text;

    public static string Location(SourceSpan span)
        => span.IsKnown ? $"{DisplayPath(span.Path)}:{span.Line.ToString(CultureInfo.InvariantCulture)}" : "(unknown location)";

    /// <summary>A path as the user would type it: relative to the working directory when it lies below it.</summary>
    public static string DisplayPath(string path)
    {
        if (string.IsNullOrEmpty(path) || !System.IO.Path.IsPathFullyQualified(path))
            return path;
        var relative = System.IO.Path.GetRelativePath(System.Environment.CurrentDirectory, path);
        return relative.StartsWith("..", System.StringComparison.Ordinal) || System.IO.Path.IsPathFullyQualified(relative) ? path : relative;
    }

    public static string ShortLocation(SourceSpan span)
        => span.IsKnown ? $"{System.IO.Path.GetFileName(span.Path)}:{span.Line.ToString(CultureInfo.InvariantCulture)}" : "?";

    /// <summary>"1 clock", "2 clocks".</summary>
    public static string Count(int count, string noun)
        => count.ToString(CultureInfo.InvariantCulture) + " " + noun + (count == 1 ? string.Empty : "s");

    /// <summary>"1 error", "3 warnings", "2 info" (info takes no plural).</summary>
    public static string Count(int count, ReportSeverity severity)
        => severity == ReportSeverity.Info ? count.ToString(CultureInfo.InvariantCulture) + " info" : Count(count, SeverityPolicy.Name(severity));

    public static string Window(PhaseWindow window) => $"[{window.Opens}, {window.Closes})";

    public static string ClockKindText(Clock clock) => clock.Kind switch
    {
        ClockKind.Root => $"root, period {clock.Period}, duty {clock.Duty.ToString("0.##", CultureInfo.InvariantCulture)}, complement skew {clock.ComplementSkew}",
        ClockKind.Gated => $"gated from {clock.Source!.Name} by {clock.Enable?.Name ?? "?"}, stops {(clock.StopLevel == ClockStopLevel.High ? "high" : "low")}, "
            + $"idle bound {clock.MaxIdle?.ToString() ?? "none"}",
        _ => $"buffered from {clock.Source!.Name}, +{clock.Delay} (total {clock.DelayFromRoot} after {clock.Root.Name})",
    };

    public static string LatchKind(Latch latch) => latch.IsStatic ? "static" : "dynamic";

    public static string FindingIds(DesignReport report, Latch latch)
        => string.Join(",", report.FindingsOf(latch).Select(f => f.RuleId).Distinct());
}
