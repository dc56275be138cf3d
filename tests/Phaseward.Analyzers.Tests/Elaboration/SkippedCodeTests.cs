using System;
using System.Linq;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Code the elaborator does not run (a branch whose condition is unknown, a call on an object or delegate that is not
/// known) may have written state, or jumped out of where it stands. What it may have written must read as unknown
/// afterwards, and what it may have jumped over must be skipped: never read as it was before. Before, only the
/// variables named in the skipped code itself were made unknown: a field written by a method it calls, a captured
/// local written by a delegate called later, a collection changed through another name, the rest of a method after a
/// skipped <c>return</c> or of a loop after a skipped <c>break</c> were all read or run as if nothing had been skipped,
/// with no finding beyond the PW9001 at the unknown value.
/// </summary>
/// <remarks>
/// The oracle is the design compiled and run by .NET: <c>Environment.ProcessorCount &gt; 0</c> is true on every machine,
/// so the run-time netlist shows the value the skipped code makes, which the elaborator cannot know and must not
/// replace with the value from before.
/// </remarks>
public class SkippedCodeTests
{
    private const string Unknown = "System.Environment.ProcessorCount > 0";

    private const string Declarations = """
        public sealed class Box { public static int Made = 2; public void Set() => Made = 6; }
        public sealed class Cell { public int V = 1; }
        public static class Holder<T> { public static int Value = 2; public static void Set() => Value = 6; }
        public sealed class Tally<T> { public static int Made; static Tally() { Made = 2; } public void Set() => Made = 7; }
        """;

    private const string Members = """
        private int extra = 1;
        private int other = 3;
        private readonly System.Collections.Generic.List<int> marks = new();
        private event System.Action? Fired;
        private void Bump() => extra = 7;
        private int Twice() { extra = 8; return 2; }
        private void Mark() => marks.Add(1);
        private static void Add(ref int x) => x += 10;
        private ref int Pick() => ref other;
        private int Risky() { if (System.Environment.ProcessorCount > 0) throw new System.InvalidOperationException(); return 5; }
        """;

    [Theory]
    // a method the skipped code calls writes a field
    [InlineData("if (" + Unknown + ") Bump(); count = extra;", 7)]
    [InlineData("for (var i = 0; i < System.Environment.ProcessorCount; i++) Bump(); count = extra;", 7)]
    [InlineData("switch (System.Environment.ProcessorCount) { case > 0: Bump(); break; } count = extra;", 7)]
    [InlineData("var n = " + Unknown + " ? 1 : 2; var w = n switch { 1 => Twice(), _ => 0 }; count = extra;", 8)]
    [InlineData("var ok = " + Unknown + " && Twice() > 0; count = extra;", 8)]
    [InlineData("var w = (" + Unknown + " ? 1 : 0) + Twice(); count = extra;", 8)]
    [InlineData("try { if (" + Unknown + ") Bump(); } finally { } count = extra;", 7)]
    // a static of another type, on its first use
    [InlineData("var box = new Box(); if (" + Unknown + ") box.Set(); count = Box.Made;", 6)]
    // a static of a generic type's construction, first made in (or after) the skipped code
    [InlineData("if (" + Unknown + ") Holder<int>.Value = 6; count = Holder<int>.Value;", 6)]
    [InlineData("if (" + Unknown + ") Holder<string>.Set(); count = Holder<string>.Value;", 6)]
    [InlineData("if (" + Unknown + ") new Tally<long>().Set(); count = Tally<long>.Made;", 7)]
    // a call on an object that is not known
    [InlineData("var box = new Box(); if (" + Unknown + ") box = new Box(); box.Set(); count = Box.Made;", 6)]
    [InlineData("var box = " + Unknown + " ? new Box() : null; box?.Set(); count = Box.Made;", 6)]
    [InlineData("var a = new Cell(); var b = new Cell(); var pick = " + Unknown + " ? a : b; pick.V = 6; count = a.V;", 6)]
    // a delegate that is not known, called later
    [InlineData("System.Action a = " + Unknown + " ? () => count = 7 : () => count = 8; count = 5; a();", 7)]
    [InlineData("System.Action a = () => count = 7; if (" + Unknown + ") a = () => count = 9; count = 5; a();", 9)]
    [InlineData("System.Action a = () => count = 7; if (" + Unknown + ") a = Bump; extra = 5; a(); count = extra;", 7)]
    [InlineData("System.Action a = " + Unknown + " ? Bump : () => { }; extra = 5; a.Invoke(); count = extra;", 7)]
    [InlineData("var acts = new System.Collections.Generic.List<System.Action> { Bump }; if (" + Unknown + ") acts.Add(() => extra = 9); extra = 5; foreach (var a in acts) a(); count = extra;", 9)]
    [InlineData("Fired += Bump; if (" + Unknown + ") Fired = null; extra = 5; Fired?.Invoke(); count = extra;", 5)]
    // a collection changed through another name
    [InlineData("var view = marks; if (" + Unknown + ") Mark(); count = view.Count + 3;", 4)]
    // a jump out of the skipped code: what it would have skipped is skipped too
    [InlineData("if (!(" + Unknown + ")) return;", 3)]
    [InlineData("count = Pick(); int Pick() { if (" + Unknown + ") return 5; return 6; }", 5)]
    [InlineData("for (var i = 0; i < 3; i++) { if (" + Unknown + " && i == 1) break; count++; }", 4)]
    [InlineData("for (var i = 0; i < 3; i++) { if (" + Unknown + " && i == 1) continue; count++; }", 5)]
    [InlineData("var k = 0; foreach (var n in new[] { 1, 2 }) { if (n > 1 && " + Unknown + ") break; k++; } count = k;", 1)]
    [InlineData("switch (count) { case 3: if (" + Unknown + ") break; count = 9; break; } count++;", 4)]
    [InlineData("try { if (" + Unknown + ") throw new System.InvalidOperationException(); count = 5; } catch (System.InvalidOperationException) { count = 6; }", 6)]
    [InlineData("try { count = Risky(); count += 1; } catch (System.InvalidOperationException) { count = 9; }", 9)]
    [InlineData("try { Bump(); foreach (var k in new[] { 1, 2 }) Risky(); extra = 2; } catch (System.InvalidOperationException) { } count = extra;", 7)]
    public void WhatSkippedCodeMayHaveChangedIsNeverReadAsBefore(string statements, int stagesAtRunTime)
    {
        var designs = Designs(statements);
        Assert.Equal(stagesAtRunTime, designs.RunTime("Skipped.D").Devices.Count(IsStage));

        var compileTime = designs.CompileTime("Skipped.D");
        var issue = Assert.Single(compileTime.Issues);
        Assert.Equal(RuleCatalog.NotElaborated.Id, issue.RuleId);
        Assert.DoesNotContain(compileTime.Netlist!.Devices, IsStage);
    }

    [Theory]
    // a write the elaborator cannot make (reported there): what it would have changed is not read as before
    [InlineData("var arr = new[] { 1 }; Add(ref arr[0]); count = arr[0] + 3;", 14, "this ref/out argument")]
    [InlineData("var t = (a: 1, b: 2); t.a += 10; count = t.a;", 11, "this assignment target")]
    [InlineData("Pick() = 7; count = other;", 7, "this assignment target")]
    public void WhatAWriteTheElaboratorCannotMakeWouldChangeIsUnknown(string statements, int stagesAtRunTime, string reported)
    {
        var designs = Designs(statements);
        Assert.Equal(stagesAtRunTime, designs.RunTime("Skipped.D").Devices.Count(IsStage));

        var compileTime = designs.CompileTime("Skipped.D");
        var issue = Assert.Single(compileTime.Issues);
        Assert.Equal(RuleCatalog.NotElaborated.Id, issue.RuleId);
        Assert.Equal(reported, issue.Arguments[0]);
        Assert.DoesNotContain(compileTime.Netlist!.Devices, IsStage);
    }

    [Theory]
    // what the skipped code cannot have written stays known: the netlist is the run-time one
    [InlineData("if (" + Unknown + ") Bump(); count = other + 1;")]
    [InlineData("if (" + Unknown + ") Bump(); count = 4;")]
    [InlineData("var list = new System.Collections.Generic.List<int> { 1, 2 }; if (" + Unknown + ") extra = 2; count = list.Count + 2;")]
    [InlineData("if (" + Unknown + ") extra = 2; count = Holder<int>.Value + 2;")]
    [InlineData("if (" + Unknown + ") Mark(); var fresh = new System.Collections.Generic.List<int> { 1 }; count = fresh.Count + 4;")]
    [InlineData("for (var i = 0; i < 2; i++) { if (" + Unknown + ") { var local = 1; local++; } count++; }")]
    [InlineData("if (" + Unknown + ") { foreach (var n in new[] { 1 }) { if (n > 0) break; } } count = 5;")]
    [InlineData("var strict = " + Unknown + "; if (strict && other < 0) throw new System.ArgumentException(\"checked\"); count = 4;")]
    public void WhatSkippedCodeCannotHaveChangedStaysKnown(string statements)
        => ParityTests.AssertParity(Designs(statements), "Skipped.D", allowNotElaborated: true);

    private static bool IsStage(Netlists.Device device) => device.Name.StartsWith("s", StringComparison.Ordinal);

    private static InMemoryDesigns Designs(string statements)
        => new(("/skipped/D.cs", InverterChainDesign.Source("Skipped", Declarations, Members, statements)));
}
