namespace Phaseward.Reproducers;

/// <summary>
/// The simple device models every deck uses, as subcircuits a user can replace: put subcircuits of the same names
/// and pins (for example transistor-level ones on the foundry's models) in a file and include it instead.
/// </summary>
internal static class SimpleModels
{
    public const string Text = """
        * ---- Simple models (switch level). HOOK: to use your own devices, replace this block by
        * .include my-phaseward-models.lib
        * defining the same subcircuits and pins:
        *   pw_tg  a b on   params: ron   a pass device (transmission gate) conducting while V(on) > vdd/2
        *   pw_inv in out   params: r     an inverting restoring stage with output resistance r
        *   pw_buf in out   params: r     a non-inverting restoring stage with output resistance r
        * pw_tg: a switch of on-resistance ron (off: 1e12 x ron). Its control is the OR of the nMOS gate (the clock)
        * and the inverted pMOS gate (the late complement), so it conducts over the whole window, skew included.
        * pw_inv / pw_buf: the ideal logic function (a steep logistic around vdd/2) behind the stage's output
        * resistance: delay 0.69*r*C into a load C, the first-order stage delay Phaseward's timing figures use.
        .subckt pw_tg a b on params: ron=5k
        .model pw_switch SW(Vt={vdd/2} Vh=0 Ron={ron} Roff={ron*1e12})
        S1 a b on 0 pw_switch
        .ends pw_tg
        .subckt pw_inv in out params: r=4k
        B1 ideal 0 V = {vdd} / (1 + exp((V(in) - {vdd/2}) / 0.01))
        R1 ideal out {r}
        .ends pw_inv
        .subckt pw_buf in out params: r=4k
        B1 ideal 0 V = {vdd} / (1 + exp(-(V(in) - {vdd/2}) / 0.01))
        R1 ideal out {r}
        .ends pw_buf
        * ---- end of simple models
        """;
}
