package cite

// Sources of the shaft package's rules for tension, interface friction and
// the λ method's limit.
var (
	Fleming2009 = Source{Key: "fleming-piling-2009", Authors: "Fleming, W.G.K., Weltman, A.J., Randolph, M.F., Elson, W.K.", Year: 2009,
		Title: "Piling Engineering", Publication: "3rd ed., Taylor & Francis, Abingdon"}
	Potyondy1961 = Source{Key: "potyondy1961", Authors: "Potyondy, J.G.", Year: 1961,
		Title: "Skin friction between various soils and construction materials", Publication: "Géotechnique 11(4), 339-353"}
)
