using System;
using System.Collections.Generic;
using Phaseward.Internal;

namespace Phaseward;

// Hierarchy: placing a block opens a name scope. The netlist stays flat for the rules; names carry the hierarchy.
public sealed partial class Circuit
{
    private readonly HashSet<string> blockPaths = new(StringComparer.Ordinal);

    // "" at the top of the design, "lane3.mux." inside a block placed as "mux" inside one placed as "lane3".
    private string scope = string.Empty;

    /// <summary>
    /// Runs <paramref name="block"/>'s Describe inside the name scope <paramref name="name"/> and returns the block, so its
    /// outputs can be read from its properties. Every net, device, cell, clock and port made inside gets the prefix
    /// <c>name.</c>; blocks placed inside blocks nest (<c>lane3.mux.n2</c>).
    /// </summary>
    /// <exception cref="ArgumentException">The name is empty, contains a '.', or is already used by a block in this scope.</exception>
    public T Place<T>(T block, string name)
        where T : Block
    {
        var outer = EnterBlock(block, name);
        try
        {
            block.DescribeOn(this);
        }
        finally
        {
            ExitBlock(outer);
        }

        return block;
    }

    /// <summary>The hierarchical path names get inside the current scope ("" at the top, else ending in '.').</summary>
    public string Scope => scope;

    /// <summary>
    /// Checks a placement and opens its scope; returns the scope to restore. Shared by <see cref="Place{T}"/> and the
    /// compile-time elaborator (which interprets the block's Describe itself between the two calls).
    /// </summary>
    internal string EnterBlock(object? block, string? name)
    {
        if (block is null)
            throw new ArgumentNullException(nameof(block), $"'{nameof(block)}' must not be null.");
        Guard.Name(name, nameof(name));
        if (name!.IndexOf('.') >= 0)
            throw new ArgumentException($"'{nameof(name)}': a block's instance name cannot contain '.' (was \"{name}\"); blocks nest by placing one inside another.", nameof(name));
        var path = scope + name;
        if (blockPaths.Contains(path))
            throw new ArgumentException(
                $"'{nameof(name)}': a block named \"{name}\" is already placed in {(scope.Length == 0 ? "design '" + DesignName + "'" : "block '" + scope.TrimEnd('.') + "'")}; give each instance its own name.",
                nameof(name));
        blockPaths.Add(path);
        var outer = scope;
        scope = path + ".";
        return outer;
    }

    internal void ExitBlock(string outer) => scope = outer;

    // A name given inside a block, with the block's path in front.
    private string Scoped(string name) => scope.Length == 0 ? name : scope + name;

    private string? ScopedOrNull(string? name) => name is null ? null : Scoped(name);

    // A name made from a net's or clock's (already scoped) name: scoped only if it was made outside this block.
    private string ScopedOnce(string derived) => scope.Length == 0 || derived.StartsWith(scope, StringComparison.Ordinal) ? derived : scope + derived;
}
