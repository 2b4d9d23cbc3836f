namespace Integrable.Kernels;

/// <summary>Multiplication algorithms.</summary>
internal enum MultiplyAlgorithm
{
    /// <summary>Let the dispatcher choose.</summary>
    Auto,
    /// <summary>Johnson's heap method.</summary>
    Heap,
    /// <summary>Dense array (Kronecker) method.</summary>
    Dense,
}
