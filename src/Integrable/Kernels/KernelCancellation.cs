using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

/// <summary>The cancellation token of the analysis that is running on this logical thread, polled by
/// the hot loops so that a request is honoured within milliseconds even in the middle of one large
/// multiplication, division or gcd. Kernels take no token parameter (their signatures stay raw spans);
/// instead a public entry point opens a scope with <see cref="Enter"/>, and the loops call
/// <see cref="Poll"/> every few thousand iterations. The scope flows to tasks started inside it
/// (it lives in an <see cref="AsyncLocal{T}"/>), and nested scopes restore the outer one.</summary>
internal static class KernelCancellation
{
    private static readonly AsyncLocal<TokenBox?> Current = new();

    internal sealed class TokenBox(CancellationToken token)
    {
        public readonly CancellationToken Token = token;
    }

    /// <summary>Makes <paramref name="token"/> the one polled by kernels until the scope is disposed.
    /// A token that cannot be cancelled leaves the current scope in place.</summary>
    public static Scope Enter(CancellationToken token)
    {
        if (!token.CanBeCanceled) return default;
        var previous = Current.Value;
        Current.Value = new TokenBox(token);
        return new Scope(previous, active: true);
    }

    /// <summary>Throws <see cref="OperationCanceledException"/> when the current scope's token is cancelled.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Poll()
    {
        var box = Current.Value;
        if (box is not null && box.Token.IsCancellationRequested) Throw(box.Token);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void Throw(CancellationToken token) => token.ThrowIfCancellationRequested();

    /// <summary>Restores the enclosing scope when disposed.</summary>
    internal readonly struct Scope : IDisposable
    {
        private readonly TokenBox? _previous;
        private readonly bool _active;

        internal Scope(TokenBox? previous, bool active)
        {
            _previous = previous;
            _active = active;
        }

        /// <summary>Restores the enclosing scope.</summary>
        public void Dispose()
        {
            if (_active) Current.Value = _previous;
        }
    }
}
