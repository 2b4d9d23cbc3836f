using System.Buffers;
using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

/// <summary>Scratch arrays of the kernels, rented from the shared pool so that large temporaries
/// (which would land on the large-object heap) do not trigger full garbage collections.</summary>
internal static class Pool
{
    /// <summary>An array of at least <paramref name="minLength"/> elements with unspecified contents.</summary>
    public static T[] Rent<T>(int minLength) => ArrayPool<T>.Shared.Rent(Math.Max(minLength, 16));

    /// <summary>An array of at least <paramref name="minLength"/> elements whose first
    /// <paramref name="minLength"/> elements are default.</summary>
    public static T[] RentCleared<T>(int minLength)
    {
        var a = Rent<T>(minLength);
        Array.Clear(a, 0, minLength);
        return a;
    }

    /// <summary>Returns an array obtained from <see cref="Rent{T}"/>.</summary>
    public static void Return<T>(T[] array) =>
        ArrayPool<T>.Shared.Return(array, clearArray: RuntimeHelpers.IsReferenceOrContainsReferences<T>());

    /// <summary>Replaces <paramref name="array"/> (holding <paramref name="count"/> live elements) by a
    /// rented array of at least <paramref name="needed"/> elements (geometric growth).</summary>
    public static void Grow<T>(ref T[] array, int count, int needed)
    {
        var bigger = Rent<T>(Math.Max(needed, array.Length + (array.Length >> 1)));
        Array.Copy(array, bigger, count);
        Return(array);
        array = bigger;
    }
}
