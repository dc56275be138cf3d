using System;
using System.Runtime.CompilerServices;
using Phaseward.Internal;
using Phaseward.Netlists;

namespace Phaseward;

public sealed partial class Circuit
{
    /// <summary>A primary input, driven from outside through the process's driver resistance.</summary>
    public Net Input(string name, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        Guard.Name(name, nameof(name));
        name = Scoped(name);
        CheckNewNetName(name, nameof(name));
        var net = NewNet(name);
        inputs.Add(new Port(name, net, Site(callerFile, callerLine)));
        netDrives[net.Id] |= NetDrive.PrimaryInput;
        return net;
    }

    /// <summary>Names a net as a primary output.</summary>
    public void Output(string name, Net net, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        Guard.Name(name, nameof(name));
        CheckNet(net, nameof(net));
        name = Scoped(name);
        if (outputNames.Contains(name))
            throw new ArgumentException($"'{nameof(name)}': an output named \"{name}\" already exists in design '{DesignName}'.", nameof(name));
        outputNames.Add(name);
        outputs.Add(new Port(name, net, Site(callerFile, callerLine)));
    }
}
