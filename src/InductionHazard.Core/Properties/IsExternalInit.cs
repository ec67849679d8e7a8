// netstandard2.0 lacks the marker type that init-only setters and records need.
namespace System.Runtime.CompilerServices;

internal static class IsExternalInit
{
}
