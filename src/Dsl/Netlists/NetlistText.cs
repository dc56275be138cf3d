using System.Globalization;
using System.Linq;
using System.Text;

namespace Phaseward.Netlists;

/// <summary>
/// A canonical, line-per-item text form of a netlist: the same design gives the same text however it was
/// elaborated (at run time or inside the compiler). Used by the parity tests and handy when debugging a design.
/// </summary>
public static class NetlistText
{
    /// <summary>The canonical text of <paramref name="netlist"/>, with each item's source span when <paramref name="includeSpans"/> is true.</summary>
    public static string Write(Netlist netlist, bool includeSpans)
    {
        var text = new StringBuilder();
        text.Append("design ").Append(netlist.DesignName).Append(" process=").Append(netlist.Process.Name).AppendLine();
        foreach (var clock in netlist.Clocks)
        {
            text.Append("clock ").Append(clock.Name).Append(' ').Append(clock.Kind)
                .Append(" period=").Append(clock.Period).Append(" duty=").Append(clock.Duty.ToString("R", CultureInfo.InvariantCulture))
                .Append(" skew=").Append(clock.ComplementSkew);
            if (clock.Kind == ClockKind.Root && clock.Offset != Time.Zero) text.Append(" offset=").Append(clock.Offset);
            if (clock.Kind == ClockKind.Root && clock.IsIndependent) text.Append(" independent");
            if (clock.Source is { } source) text.Append(" from=").Append(source.Name);
            if (clock.Kind == ClockKind.Buffered) text.Append(" delay=").Append(clock.Delay);
            if (clock.Enable is { } enable)
                text.Append(" enable=").Append(enable.Name).Append(" stops=").Append(clock.StopLevel)
                    .Append(" max-idle=").Append(clock.MaxIdle?.ToString() ?? "unbounded");
            AppendSpan(text, clock.Span, includeSpans);
            text.AppendLine();
        }

        foreach (var port in netlist.Inputs)
        {
            text.Append("input ").Append(port.Name).Append(" net=").Append(port.Net.Name);
            AppendSpan(text, port.Span, includeSpans);
            text.AppendLine();
        }

        foreach (var net in netlist.Nets)
            text.Append("net ").Append(net.Id).Append(' ').Append(net.Name)
                .Append(" C=").Append(netlist.CapacitanceOf(net)).Append(" Ileak=").Append(netlist.LeakageOf(net)).AppendLine();

        foreach (var device in netlist.Devices)
        {
            text.Append("device ").Append(device.Id).Append(' ').Append(device.Kind).Append(' ').Append(device.Name)
                .Append(" in=").Append(string.Join(",", device.Inputs.Select(n => n.Name)))
                .Append(" out=").Append(device.Output.Name);
            if (device.ClockControl is { } phase) text.Append(" clock=").Append(phase.Name);
            if (device.DataControl is { } control) text.Append(" control=").Append(control.Name);
            text.Append(" R=").Append(netlist.ResistanceOf(device));
            if (device.IsWeak) text.Append(" weak");
            if (device.Macro is { } macro) text.Append(" cell=").Append(macro.Kind).Append(':').Append(macro.Name).Append('/').Append(device.Role);
            AppendSpan(text, device.Span, includeSpans);
            text.AppendLine();
        }

        foreach (var group in netlist.ExclusiveGroups)
            text.Append("exclusive ").Append(string.Join(",", group.Select(n => n.Name))).AppendLine();

        foreach (var port in netlist.Outputs)
        {
            text.Append("output ").Append(port.Name).Append(" net=").Append(port.Net.Name);
            AppendSpan(text, port.Span, includeSpans);
            text.AppendLine();
        }

        return text.ToString();
    }

    private static void AppendSpan(StringBuilder text, SourceSpan span, bool includeSpans)
    {
        if (!includeSpans) return;
        var file = span.Path.Replace('\\', '/');
        var slash = file.LastIndexOf('/');
        text.Append(" @").Append(slash >= 0 ? file.Substring(slash + 1) : file).Append(':').Append(span.Line);
    }
}
