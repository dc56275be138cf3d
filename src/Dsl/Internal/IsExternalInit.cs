namespace System.Runtime.CompilerServices;

// netstandard2.0 lacks this marker type; the compiler needs it for init-only setters.
internal static class IsExternalInit
{
}
