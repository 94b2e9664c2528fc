package cryst

import (
	"math"
	"testing"
)

func relErr(got, want float64) float64 { return math.Abs(got/want - 1) }

// The jacket-time formula against a direct numerical integration of the
// energy balance it comes from, m·c_p·dT/dt = −U·A·(T − Tj) (Newton's law
// of cooling for a well-stirred batch; standard heat transfer, from
// memory), with hand numbers.
func TestJacketTimeAgainstIntegration(t *testing.T) {
	t.Parallel()
	// 10 kg of water, c_p = 4184 J/(kg·K) (about 4.18 kJ/(kg·K) near 25 °C,
	// IAPWS-95, from memory), U = 200 W/(m²·K), A = 0.25 m²; from 80 °C to
	// 20 °C with the jacket at 10 °C.
	// Hand: t = 41840/50 · ln(70/10) = 836.8 s · 1.94591 = 1628.3 s (derived).
	C, U, A := 10*4184.0, 200.0, 0.25
	T0, Tf, Tj := 353.15, 293.15, 283.15
	got := JacketTime(C, U, A, T0, Tf, Tj)
	if math.Abs(got-1628.3) > 0.1 {
		t.Errorf("t = %.2f s, hand 1628.3 s", got)
	}
	// RK4 on dT/dt = −UA(T − Tj)/C until T reaches Tf; tolerance 1e-6
	// relative (step 0.01 s).
	T, time, h := T0, 0.0, 0.01
	f := func(T float64) float64 { return -U * A * (T - Tj) / C }
	for T > Tf {
		k1 := f(T)
		k2 := f(T + h/2*k1)
		k3 := f(T + h/2*k2)
		k4 := f(T + h*k3)
		next := T + h/6*(k1+2*k2+2*k3+k4)
		if next <= Tf {
			time += h * (T - Tf) / (T - next)
			break
		}
		T, time = next, time+h
	}
	if relErr(got, time) > 1e-6 {
		t.Errorf("closed form %.4f s, integrated %.4f s", got, time)
	}
	// Heating works the same way: 20 → 75 °C with the bath at 95 °C.
	if h := JacketTime(C, U, A, 293.15, 348.15, 368.15); math.Abs(h-C/(U*A)*math.Log(75.0/20)) > 1e-9 {
		t.Errorf("heating %.3f s", h)
	}
	// A jacket that cannot reach the end temperature never gets there.
	if !math.IsInf(JacketTime(C, U, A, T0, Tf, Tf+1), 1) {
		t.Error("jacket above the target must give +Inf")
	}
}

// Geometrically similar batches: area ∝ V^(2/3), heat capacity ∝ V, so
// the time ∝ V^(1/3): eight times the volume takes exactly twice as long
// (derived from the closed form of JacketTime).
func TestCoolingTimeScalesAsCubeRoot(t *testing.T) {
	t.Parallel()
	rhoCp := 789 * 2440.0 // ethanol, J/(m³·K): 0.789 g/mL × 112.3 J/(mol·K)/46.07 g/mol (CRC Handbook of Chemistry and Physics, from memory)
	tm := func(V float64) float64 {
		return JacketTime(rhoCp*V, 200, WettedArea(AreaFactorCylinder, V), 348.15, 273.15, 263.15)
	}
	for _, c := range []struct{ v1, v2, ratio float64 }{
		{0.010, 0.080, 2},  // 10 L → 80 L
		{0.001, 1.000, 10}, // 1 L → 1000 L
		{0.050, 0.100, math.Cbrt(2)},
	} {
		if r := tm(c.v2) / tm(c.v1); math.Abs(r-c.ratio) > 1e-12*c.ratio {
			t.Errorf("V %g → %g m³: time ratio %.15f, want %.15f", c.v1, c.v2, r, c.ratio)
		}
	}
}

// Shape factors against the geometry of a sphere and of a cylinder with
// height equal to diameter (derived, exact to rounding).
func TestAreaFactors(t *testing.T) {
	t.Parallel()
	V := 1e-3 // 1 L
	D := math.Cbrt(6 * V / math.Pi)
	if a := math.Pi * D * D / math.Pow(V, 2.0/3); relErr(AreaFactorSphere, a) > 1e-12 || math.Abs(AreaFactorSphere-4.836) > 1e-3 {
		t.Errorf("sphere factor %v, geometry %v", AreaFactorSphere, a)
	}
	D = math.Cbrt(4 * V / math.Pi)
	if a := (math.Pi*D*D + math.Pi*D*D/4) / math.Pow(V, 2.0/3); relErr(AreaFactorCylinder, a) > 1e-12 || math.Abs(AreaFactorCylinder-4.613) > 1e-3 {
		t.Errorf("cylinder factor %v, geometry %v", AreaFactorCylinder, a)
	}
}

func TestEffectiveHeatCapacity(t *testing.T) {
	t.Parallel()
	// 1000 J/K batch releasing 50 kJ over a 50 K drop behaves like 2000 J/K.
	if c := EffectiveHeatCapacity(1000, 50e3, -50); c != 2000 {
		t.Errorf("C_eff = %v", c)
	}
	if EffectiveHeatCapacity(1000, 5, 0) != 1000 {
		t.Error("no temperature change: no latent term")
	}
}
