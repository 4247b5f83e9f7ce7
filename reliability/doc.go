// Package reliability provides probabilistic axial capacity of a pile:
// Monte Carlo simulation and the first-order second-moment (FOSM) method
// over uncertain ground and method parameters, with a sensitivity ranking.
//
// A Problem holds the uncertain parameters (each a Param with its
// Distribution: normal, lognormal, truncated normal or uniform, from
// gonum's stat/distuv where it has them), an optional correlation matrix
// between them (a Gaussian copula: correlated standard normals z = L·u,
// with L the Cholesky factor of the correlation matrix, mapped to each
// marginal through its inverse distribution function), and a Model that
// turns one vector of parameter values into the compression and tension
// capacity. PileModel is the Model for a pile in a layered profile
// (packages profile and pile); its Target names the value each parameter
// sets: a layer's φ′, su or unit weights, a K or δ given to its β method,
// a given β, α, Nq or Nc, the depth of the water table, or a model factor
// on the tip or the shaft.
//
// MonteCarlo draws the samples in fixed blocks of BlockSize, each with its
// own random source seeded from the run's seed and the block's index, and
// writes each sample's capacity to its own slot: the result is the same,
// bit for bit, whatever the number of workers. It returns for compression
// and tension the mean, standard deviation and coefficient of variation,
// the 5, 50 and 95 % percentiles, a histogram and the empirical
// distribution function, the probability that the capacity falls below the
// given load, and the reliability index
//
//	β = (μR − Q)/σR
//
// (the second-moment index of the sampled capacity R against the load Q;
// the index −Φ⁻¹(pf) from the probability of falling short is given beside
// it where pf lies strictly between 0 and 1).
//
// FOSM takes the capacity and its gradient at the parameters' means
// (central differences with the step h = FOSMStep·σ for each parameter)
// and
//
//	σR² = Σi Σj (∂R/∂xi)(∂R/∂xj)·ρij·σi·σj
//
// (Baecher & Christian 2003, Reliability and Statistics in Geotechnical
// Engineering, ch. 14, first-order second-moment method, from memory). The
// sensitivity of R to parameter i is its share of that variance,
// (∂R/∂xi)·σi·Σj ρij·(∂R/∂xj)·σj / σR², the shares summing to 1; the
// ranking orders the parameters by |∂R/∂xi|·σi, the change of R for one
// standard deviation of the parameter.
//
// A sample outside the range a method accepts (a φ′ above 50°, a unit
// weight below that of water) stops the run with an error naming the
// parameter, the sample and the value: the sample is neither clamped nor
// dropped, since either would change the distribution the engineer gave.
// Choose a truncated normal with bounds inside the accepted range instead.
// A result never holds NaN or Inf: where σR = 0 the reliability index is
// not defined and BetaDefined is false.
//
// The results are for qualified engineers: the distributions and their
// correlations are the engineer's judgement of the site data, and the
// governing code and licensed practice prevail.
package reliability
