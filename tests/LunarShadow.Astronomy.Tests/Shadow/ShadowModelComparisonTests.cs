using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Tests.Eclipses;

namespace LunarShadow.Astronomy.Tests.Shadow;

public class ShadowModelComparisonTests
{
    // Five Millennium Canon (Danjon) 2022 Nov 08 umbral magnitude 1.3589; NASA's earlier catalogue (Chauvenet) 1.363:
    // the almanac rule gives umbral magnitudes about 0.005 larger (docs/methods.md, measured over 1900–2100).
    [Fact]
    public void Chauvenet_umbral_magnitudes_exceed_danjon_by_about_half_a_hundredth()
    {
        var danjon = EclipseOnDate.Find(2022, 11, 8);
        var chauvenet = EclipseOnDate.Find(2022, 11, 8, ShadowModel.Chauvenet);
        Assert.InRange(chauvenet.UmbralMagnitude - danjon.UmbralMagnitude, 0.003, 0.007);
        Assert.True(chauvenet.Contact(ContactName.U1)!.Tt < danjon.Contact(ContactName.U1)!.Tt);
    }

    [Fact]
    public void The_layer_model_gives_ordered_contacts_and_a_kind()
    {
        var layer = EclipseOnDate.Find(2025, 3, 14, ShadowModel.Layer());
        Assert.Equal(EclipseKind.Total, layer.Kind);
        Assert.Equal(6, layer.Contacts.Count);
        for (var i = 1; i < 6; i++) Assert.True(layer.Contacts[i - 1].Tt < layer.Contacts[i].Tt);
        Assert.Equal("layer", layer.Model.Name);
    }
}
