package scenario

// The YAML schema as read from the file. Every scalar is a Text so that it
// keeps its line; resolve.go checks each field and turns it into SI values.
// Field names here are the names a user writes (see templates/scenario.yaml).

type rawScenario struct {
	Name            Text              `yaml:"name"`
	Product         Text              `yaml:"product"`
	Masses          []Text            `yaml:"masses"`
	TargetMass      Text              `yaml:"target_mass"`
	Crude           rawCrude          `yaml:"crude"`
	Chromatography  *rawChrom         `yaml:"chromatography"`
	Crystallization *rawCryst         `yaml:"crystallization"`
	Distillation    *rawDistil        `yaml:"distillation"`
	Campaign        *rawCampaign      `yaml:"campaign"`
	Settings        map[string]Text   `yaml:"settings"`
	Solvents        []rawSolvent      `yaml:"solvents"`
	Notes           Text              `yaml:"notes"`
	WasteSector     Text              `yaml:"waste_sector"`
	Extra           map[string]rawAny `yaml:",inline"`
}

// rawAny catches unknown keys so that they are reported with their line.
type rawAny struct{ Line int }

type rawCrude struct {
	Purity          Text              `yaml:"purity"`
	NearestImpurity Text              `yaml:"nearest_impurity"`
	Line            int               `yaml:"-"`
	Extra           map[string]rawAny `yaml:",inline"`
}

type rawChrom struct {
	TLCEluent      map[string]Text   `yaml:"tlc_eluent"`
	ProductRf      Text              `yaml:"product_rf"`
	ImpurityRf     Text              `yaml:"impurity_rf"`
	Gradient       []rawStep         `yaml:"gradient"`
	Loading        Text              `yaml:"loading"`
	LoadingSolvent Text              `yaml:"loading_solvent"`
	RecoverSolvent Text              `yaml:"recover_solvent"`
	LoadingRule    Text              `yaml:"loading_rule"`
	Columns        []Text            `yaml:"column_diameters"`
	TargetPurity   Text              `yaml:"target_purity"`
	MixedFractions Text              `yaml:"mixed_fractions"`
	Extra          map[string]rawAny `yaml:",inline"`
}

type rawStep struct {
	Eluent        map[string]Text   `yaml:"eluent"`
	ColumnVolumes Text              `yaml:"column_volumes"`
	Extra         map[string]rawAny `yaml:",inline"`
}

type rawSolvent struct {
	Name         Text              `yaml:"name"`
	Aliases      []Text            `yaml:"aliases"`
	Formula      Text              `yaml:"formula"`
	Density      Text              `yaml:"density"`
	BoilingPoint Text              `yaml:"boiling_point"`
	HVap         Text              `yaml:"enthalpy_of_vaporization"`
	Cp           Text              `yaml:"heat_capacity"`
	FlashPoint   Text              `yaml:"flash_point"`
	Halogenated  Text              `yaml:"halogenated"`
	Peroxide     Text              `yaml:"peroxide_former"`
	Antoine      *rawAntoine       `yaml:"antoine"`
	Source       Text              `yaml:"source"`
	Extra        map[string]rawAny `yaml:",inline"`
}

type rawAntoine struct {
	A     Text              `yaml:"a"`
	B     Text              `yaml:"b"`
	C     Text              `yaml:"c"`
	Tmin  Text              `yaml:"t_min"`
	Tmax  Text              `yaml:"t_max"`
	Extra map[string]rawAny `yaml:",inline"`
}
