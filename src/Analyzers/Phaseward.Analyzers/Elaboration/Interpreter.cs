using System;
using System.Collections.Generic;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Interprets a design's C# over Roslyn's IOperation tree. Values are real .NET objects; DSL calls are made for real by
/// reflection, with the circuit told where each call was written. What it cannot interpret is reported once (PW9001)
/// and yields <see cref="Unknown"/>, which silently poisons everything computed from it.
/// </summary>
/// <remarks>
/// This file declares all of the interpreter's state. <c>Interpreter.Dispatch.cs</c> is the one dispatch: one
/// <c>Visit&lt;Kind&gt;</c> method per operation kind, each in the partial file of its family (Statements, Loops,
/// Exceptions, Expressions, Operators, Members, Calls, Creation, Assignments, Delegates, Types, Patterns); the other
/// partial files hold what those share (Library: values crossing into native code; Construction; Objects; Blocks;
/// Budgets: reporting and budgets).
/// </remarks>
internal sealed partial class Interpreter
{
    /// <summary>
    /// How many exceptions the design may throw (and the elaborator step over) before elaboration stops. At run time the
    /// first one ends Describe; stepping over a few keeps the rest of the design checked, but a loop that throws on
    /// every iteration would otherwise spend its whole step budget in exception handling.
    /// </summary>
    public const int MaxThrows = 100;

    // ---- given at construction ----

    // Semantic models, designs and method bodies shared by every interpreter of one compilation.
    private readonly ElaborationSession session;

    // The step, call-depth, device and memory budgets (from the .editorconfig).
    private readonly ElaborationLimits limits;

    // Honoured at every step, so an editor can cancel a long elaboration.
    private readonly CancellationToken cancellationToken;

    // ---- findings ----

    // The findings so far (PW9001-PW9003), in the order they arose.
    private readonly List<ElaborationIssue> issues = new();

    // Sites already reported (span, outermost call): one finding per site and call chain, not one per loop iteration.
    private readonly HashSet<(string Path, int Start, int OuterStart)> reportedSites = new();

    // How many exceptions were stepped over so far (see MaxThrows).
    private int throws;

    // While set, nothing is reported (see Silent).
    private bool silent;

    // ---- static state of the design's types ----

    // The storage of static fields and auto-properties of the design's source, made on first use.
    private readonly Dictionary<ISymbol, Variable> statics = new(SymbolEqualityComparer.Default);

    // Types whose static initializers and static constructor have run (C# runs them once).
    private readonly HashSet<INamedTypeSymbol> initializedTypes = new(SymbolEqualityComparer.Default);
    // Types whose static initialization threw, with the exception it threw when that is a library one.
    private readonly Dictionary<INamedTypeSymbol, Exception?> failedTypes = new(SymbolEqualityComparer.Default);

    // The structs of the design's source whose default value is being made (see DefaultStruct).
    private readonly HashSet<INamedTypeSymbol> structsBeingDefaulted = new(SymbolEqualityComparer.Default);

    // ---- where the interpretation is ----

    // The loops being run (innermost on top): the budget report points at the loop, and loop sites share spans.
    private readonly Stack<IOperation> loops = new();

    // The object an object initializer or 'with' is filling in ('{ P = v }' assigns to it).
    private readonly Stack<object> implicitReceivers = new();

    // The receiver of the '?.' being evaluated (what a ConditionalAccessInstance reads).
    private readonly Stack<object> conditionalReceivers = new();

    // The values being matched by patterns (innermost on top): what a property subpattern's member is read from.
    private readonly Stack<object?> patternInputs = new();

    // Set while a pattern is decided when a value it is matched against is unknown (reported where it arose): the
    // pattern's undecided result is then not reported a second time (see Decide).
    private bool patternMetUnknown;

    // The call chain as it stands, outermost call first (interned: see chains).
    private SourceSpan[] callers = Array.Empty<SourceSpan>();

    // Chains are interned by (outer chain, call site): a helper called from the same place in every loop iteration
    // gets the same chain array each time, so the spans made under it can be shared too (see CurrentClrSite).
    private readonly Dictionary<(SourceSpan[] Outer, SyntaxNode Site), SourceSpan[]> chains = new();

    // How deeply calls nest now (against the recursion limit).
    private int depth;

    // How many try statements enclose the code being interpreted: inside one, an exception is thrown for the design's
    // catch clauses (DesignException); outside, it is PW9003 at once.
    private int tryDepth;

    // The exceptions being handled by catch clauses (innermost last), for 'throw;'.
    private readonly Stack<object> caught = new();

    // The try statements whose bodies are running (innermost last), with their frames and caller chains: an exception's
    // handler is sought among them, filters included, before any finally runs (see FindHandler).
    private List<(ITryOperation Statement, Frame Frame, SourceSpan[] Callers)> activeTries = new();

    // The call a foreach is about to enumerate, and the loop's body as a callback: when that call runs the design's
    // iterator, each 'yield return' hands its value to the body at once instead of collecting a list, so the iterator
    // runs only as far as the loop takes it and both sides' effects interleave as in C# (see VisitForEachLoop).
    private (IOperation Site, Func<object?, bool> Consume)? streamTo;

    // What the design's code has done outside the frame it runs in (calls on the circuit; stores to fields, statics,
    // captured variables and collections held there), counted while an iterator runs to completion when called: if it
    // changes, the iterator had effects that would come earlier than in C# (PW9001, see InvokeUser).
    private long externalEffects;

    // Objects made after this serial belong to the iterator being run to completion: stores to them are not effects.
    private long iteratorObjectsAfter = long.MaxValue;

    // Resources of 'using var' declarations, per block that has them (innermost last): disposed when the block ends.
    private readonly Stack<List<object?>> usingScopes = new();

    // Set when a method's body may have thrown in code that was skipped (inside a try somewhere): the statement of the
    // caller that called it may then have ended there too (see AfterStatement).
    private bool mayHaveThrown;

    // How each piece of skipped code can jump out of itself (see EscapeOf).
    private readonly Dictionary<IOperation, (Completion Escape, Completion UnlessThrown)> escapes = new();

    // Writes in code the elaborator did not run, and when: what they may have changed reads as unknown (see Read).
    private readonly SkippedWrites skippedWrites = new();

    // What skipped code may write, found from its source (made when code is first skipped).
    private SkippedEffects? skippedEffects;

    // Bytes charged against the memory budget (see ChargeMemory).
    private long allocatedBytes;

    // ---- the call into native code under way ----

    // The site of the DSL or library call being made: where the circuit places what it makes, and where callbacks
    // into the design's code are reported.
    private IOperation? clrSite;

    // The call chain at clrSite.
    private SourceSpan[] clrSiteCallers = Array.Empty<SourceSpan>();

    // One delegate per interpreter handed to the circuit (CurrentClrSite), not a closure per call.
    private Func<SourceSpan>? clrSiteProvider;

    // ---- caches (speed only: they never change a result) ----

    // Inside a loop the same call is made with the same caller chain (chains are interned, see PushCaller) on every
    // iteration: its span is built once and shared by every device made there. Straight-line code makes each call
    // once, so nothing is cached for it.
    private readonly Dictionary<(SyntaxNode Site, SourceSpan[] Callers), SourceSpan> loopSites = new();

    // The most variables a call of each method body has held: the next call's frame starts that large instead of
    // growing its table step by step (a helper called once per loop iteration would otherwise regrow it every time).
    private readonly Dictionary<IOperation, int> frameSizes = new();

    // Whether each method body is an iterator (has 'yield'): iterators are run to completion when called, their
    // yielded values kept in a list (see docs/elaboration.md).
    private readonly Dictionary<IOperation, bool> iterators = new();

    // Whether each for loop's header has a compile error, asked once per loop (a loop in a helper is reached once per
    // call): such a loop is skipped, not run (see VisitForLoop).
    private readonly Dictionary<IOperation, bool> brokenLoopHeaders = new();

    public Interpreter(ElaborationSession session, string designName, ElaborationLimits limits, CancellationToken cancellationToken)
    {
        this.session = session;
        DesignName = designName;
        this.limits = limits;
        this.cancellationToken = cancellationToken;
    }

    /// <summary>The design's name (for messages); updated once the design's Name property is known.</summary>
    public string DesignName { get; set; }

    /// <summary>The circuit DSL calls go to (null while constructing the design).</summary>
    public Circuit? Circuit { get; set; }

    /// <summary>When set, nothing is reported (used to probe whether constructor arguments are known).</summary>
    public bool Silent
    {
        get => silent;
        set
        {
            // Static state made while nothing was reported is forgotten: made again later, its problems are reported.
            if (silent && !value)
            {
                statics.Clear();
                initializedTypes.Clear();
                failedTypes.Clear();
            }

            silent = value;
        }
    }

    /// <summary>Steps taken so far (loop iterations, calls, elements of lazy sequences) against the step budget.</summary>
    public long Steps { get; private set; }

    public IReadOnlyList<ElaborationIssue> Issues => issues;

    /// <summary>The statement being interpreted, for reporting an unexpected failure of the interpreter itself.</summary>
    public IOperation? Current { get; private set; }

    /// <summary>The call chain as it stands, outermost call first.</summary>
    public IReadOnlyList<SourceSpan> Callers => callers;
}
