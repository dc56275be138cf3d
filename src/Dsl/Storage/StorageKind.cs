namespace Phaseward.Storage;

/// <summary>What, if anything, restores a storage node (a net driven only through pass devices).</summary>
public enum StorageKind
{
    /// <summary>No feedback path: the node holds its level only as charge while every driver is off.</summary>
    Dynamic,

    /// <summary>
    /// A pass device feeds the node a restored, non-inverted copy of itself (a static latch's feedback gate). The
    /// node is restored while that gate conducts and floats, like a dynamic node, while it does not.
    /// </summary>
    ClockedFeedback,
}
