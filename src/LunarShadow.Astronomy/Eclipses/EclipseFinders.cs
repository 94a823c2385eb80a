using LunarShadow.Astronomy.Shadow;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The eclipse finders of a process, one per shadow model, each with its cache of solved lunations. Register one
/// instance as a singleton (the web host does); <see cref="Shared"/> is the default for code without dependency
/// injection. Thread-safe: each model's finder is created once, and finders for caller-chosen layer heights and measured
/// enlargements are kept for at most <see cref="MaxLayerFinders"/> models at a time, evicted under a lock.
/// </summary>
public sealed class EclipseFinders
{
    /// <summary>Layer heights and measured enlargements vary; at most this many such finders (and their caches) are kept.</summary>
    public const int MaxLayerFinders = 8;

    private readonly Func<ShadowModel, EclipseFinder> _create;
    private readonly Dictionary<ShadowModel, EclipseFinder> _finders = [];
    private readonly Lock _gate = new();

    /// <summary>Finders on the embedded ephemerides.</summary>
    public EclipseFinders()
        : this(model => EclipseFinder.OnEmbeddedEphemerides(model))
    {
    }

    /// <summary>Finders made by the given factory (called once per model kept).</summary>
    public EclipseFinders(Func<ShadowModel, EclipseFinder> create) => _create = create;

    /// <summary>The process-wide default set, for use without dependency injection.</summary>
    public static EclipseFinders Shared { get; } = new();

    /// <summary>The finder for a model.</summary>
    public EclipseFinder For(ShadowModel model)
    {
        lock (_gate)
        {
            if (_finders.TryGetValue(model, out var known)) return known;
            if (Chosen(model) && _finders.Keys.Count(k => k.Kind is ShadowModelKind.Layer or ShadowModelKind.Enlarged) >= MaxLayerFinders)
            {
                // Keep the default height; drop the caller-chosen ones (callers holding one keep using it).
                foreach (var stale in _finders.Keys.Where(Chosen).ToList())
                    _finders.Remove(stale);
            }
            var finder = _create(model);
            _finders.Add(model, finder);
            return finder;
        }
    }

    // A model whose parameter a caller chose (a layer height other than the default) or a measurement gave (an enlargement).
    private static bool Chosen(ShadowModel model) =>
        model.Kind == ShadowModelKind.Enlarged || (model.Kind == ShadowModelKind.Layer && model.LayerHeightKm != ShadowModel.DefaultLayerHeightKm);

    /// <summary>How many finders are kept now.</summary>
    public int Count
    {
        get
        {
            lock (_gate) return _finders.Count;
        }
    }
}
