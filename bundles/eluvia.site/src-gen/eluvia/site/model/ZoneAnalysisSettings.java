/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Zone Analysis Settings</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * How the zone analysis estimates the soil above the cleanup level from the samples (eluvia.design, eluvia.zone) and after which delays the zone enlarged by dispersion is computed. Values set for a single run by a caller of the pipeline win over these.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getEstimator <em>Estimator</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getNonDetectRule <em>Non Detect Rule</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getInverseDistancePower <em>Inverse Distance Power</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getMaximumNeighbours <em>Maximum Neighbours</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getSearchRadiusMetres <em>Search Radius Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getVerticalDistanceFactor <em>Vertical Distance Factor</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getBlockPlanSizeMetres <em>Block Plan Size Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getBlockDepthMetres <em>Block Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramModel <em>Variogram Model</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramNuggetMgPerKgSquared <em>Variogram Nugget Mg Per Kg Squared</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramSillMgPerKgSquared <em>Variogram Sill Mg Per Kg Squared</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramRangeMetres <em>Variogram Range Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getDelayYears <em>Delay Years</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getTransverseDispersivityFraction <em>Transverse Dispersivity Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.ZoneAnalysisSettings#getHotSpotMultiple <em>Hot Spot Multiple</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings()
 * @model
 * @generated
 */
public interface ZoneAnalysisSettings extends EObject {
	/**
	 * Returns the value of the '<em><b>Estimator</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.ZoneEstimatorKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Estimator of the block concentrations: inverse-distance weighting (Shepard 1968) or ordinary kriging (Matheron 1963; Isaaks and Srivastava 1989).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Estimator</em>' attribute.
	 * @see eluvia.site.model.ZoneEstimatorKind
	 * @see #setEstimator(ZoneEstimatorKind)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_Estimator()
	 * @model
	 * @generated
	 */
	ZoneEstimatorKind getEstimator();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getEstimator <em>Estimator</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Estimator</em>' attribute.
	 * @see eluvia.site.model.ZoneEstimatorKind
	 * @see #getEstimator()
	 * @generated
	 */
	void setEstimator(ZoneEstimatorKind value);

	/**
	 * Returns the value of the '<em><b>Non Detect Rule</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.NonDetectValue}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The value a non-detect takes in the estimate (half the detection limit by common practice).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Non Detect Rule</em>' attribute.
	 * @see eluvia.site.model.NonDetectValue
	 * @see #setNonDetectRule(NonDetectValue)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_NonDetectRule()
	 * @model
	 * @generated
	 */
	NonDetectValue getNonDetectRule();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getNonDetectRule <em>Non Detect Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Non Detect Rule</em>' attribute.
	 * @see eluvia.site.model.NonDetectValue
	 * @see #getNonDetectRule()
	 * @generated
	 */
	void setNonDetectRule(NonDetectValue value);

	/**
	 * Returns the value of the '<em><b>Inverse Distance Power</b></em>' attribute.
	 * The default value is <code>"2.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Power of the inverse-distance weights (dimensionless), greater than 0 and at most 20; 2 is common practice.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Inverse Distance Power</em>' attribute.
	 * @see #setInverseDistancePower(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_InverseDistancePower()
	 * @model default="2.0"
	 * @generated
	 */
	double getInverseDistancePower();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getInverseDistancePower <em>Inverse Distance Power</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Inverse Distance Power</em>' attribute.
	 * @see #getInverseDistancePower()
	 * @generated
	 */
	void setInverseDistancePower(double value);

	/**
	 * Returns the value of the '<em><b>Maximum Neighbours</b></em>' attribute.
	 * The default value is <code>"16"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Most samples used per block by either estimator (a count, no unit), 1 to 200; 16 is common practice.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Maximum Neighbours</em>' attribute.
	 * @see #setMaximumNeighbours(int)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_MaximumNeighbours()
	 * @model default="16"
	 * @generated
	 */
	int getMaximumNeighbours();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getMaximumNeighbours <em>Maximum Neighbours</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Maximum Neighbours</em>' attribute.
	 * @see #getMaximumNeighbours()
	 * @generated
	 */
	void setMaximumNeighbours(int value);

	/**
	 * Returns the value of the '<em><b>Search Radius Metres</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Search radius of the estimators, m (vertically scaled distance); 0 for none entered: the automatic choice, the largest distance from a sampling location to its nearest neighbour. Blocks farther from every sample have no estimate.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Search Radius Metres</em>' attribute.
	 * @see #setSearchRadiusMetres(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_SearchRadiusMetres()
	 * @model default="0.0"
	 * @generated
	 */
	double getSearchRadiusMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getSearchRadiusMetres <em>Search Radius Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Search Radius Metres</em>' attribute.
	 * @see #getSearchRadiusMetres()
	 * @generated
	 */
	void setSearchRadiusMetres(double value);

	/**
	 * Returns the value of the '<em><b>Vertical Distance Factor</b></em>' attribute.
	 * The default value is <code>"10.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Vertical distance factor (dimensionless): the horizontal range of correlation over the vertical one; vertical separations are multiplied by it. Greater than 0 and at most 1000; 1 is isotropic, 10 the stated default.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Vertical Distance Factor</em>' attribute.
	 * @see #setVerticalDistanceFactor(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_VerticalDistanceFactor()
	 * @model default="10.0"
	 * @generated
	 */
	double getVerticalDistanceFactor();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getVerticalDistanceFactor <em>Vertical Distance Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Vertical Distance Factor</em>' attribute.
	 * @see #getVerticalDistanceFactor()
	 * @generated
	 */
	void setVerticalDistanceFactor(double value);

	/**
	 * Returns the value of the '<em><b>Block Plan Size Metres</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Plan size of a block, m, greater than 0 and at most 1000; 0 for the automatic choice.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Block Plan Size Metres</em>' attribute.
	 * @see #setBlockPlanSizeMetres(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_BlockPlanSizeMetres()
	 * @model default="0.0"
	 * @generated
	 */
	double getBlockPlanSizeMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getBlockPlanSizeMetres <em>Block Plan Size Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Block Plan Size Metres</em>' attribute.
	 * @see #getBlockPlanSizeMetres()
	 * @generated
	 */
	void setBlockPlanSizeMetres(double value);

	/**
	 * Returns the value of the '<em><b>Block Depth Metres</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Depth of a block, m, greater than 0 and at most 100; 0 for the automatic choice.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Block Depth Metres</em>' attribute.
	 * @see #setBlockDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_BlockDepthMetres()
	 * @model default="0.0"
	 * @generated
	 */
	double getBlockDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getBlockDepthMetres <em>Block Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Block Depth Metres</em>' attribute.
	 * @see #getBlockDepthMetres()
	 * @generated
	 */
	void setBlockDepthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Variogram Model</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.VariogramShapeKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Shape of the variogram structure for kriging (Isaaks and Srivastava 1989, ch. 16). Used when the variogram range is given.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Variogram Model</em>' attribute.
	 * @see eluvia.site.model.VariogramShapeKind
	 * @see #setVariogramModel(VariogramShapeKind)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_VariogramModel()
	 * @model
	 * @generated
	 */
	VariogramShapeKind getVariogramModel();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramModel <em>Variogram Model</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Variogram Model</em>' attribute.
	 * @see eluvia.site.model.VariogramShapeKind
	 * @see #getVariogramModel()
	 * @generated
	 */
	void setVariogramModel(VariogramShapeKind value);

	/**
	 * Returns the value of the '<em><b>Variogram Nugget Mg Per Kg Squared</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Nugget of the variogram, (mg/kg)^2, 0 or more and less than the sill.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Variogram Nugget Mg Per Kg Squared</em>' attribute.
	 * @see #setVariogramNuggetMgPerKgSquared(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_VariogramNuggetMgPerKgSquared()
	 * @model default="0.0"
	 * @generated
	 */
	double getVariogramNuggetMgPerKgSquared();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramNuggetMgPerKgSquared <em>Variogram Nugget Mg Per Kg Squared</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Variogram Nugget Mg Per Kg Squared</em>' attribute.
	 * @see #getVariogramNuggetMgPerKgSquared()
	 * @generated
	 */
	void setVariogramNuggetMgPerKgSquared(double value);

	/**
	 * Returns the value of the '<em><b>Variogram Sill Mg Per Kg Squared</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Total sill of the variogram (nugget included), (mg/kg)^2; greater than 0 when the range is given, 0 with the automatic first guess.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Variogram Sill Mg Per Kg Squared</em>' attribute.
	 * @see #setVariogramSillMgPerKgSquared(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_VariogramSillMgPerKgSquared()
	 * @model default="0.0"
	 * @generated
	 */
	double getVariogramSillMgPerKgSquared();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramSillMgPerKgSquared <em>Variogram Sill Mg Per Kg Squared</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Variogram Sill Mg Per Kg Squared</em>' attribute.
	 * @see #getVariogramSillMgPerKgSquared()
	 * @generated
	 */
	void setVariogramSillMgPerKgSquared(double value);

	/**
	 * Returns the value of the '<em><b>Variogram Range Metres</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Range of the variogram (practical range for the exponential and Gaussian shapes), m (vertically scaled); 0 for the automatic first guess: spherical, no nugget, sill = sample variance, range = half the largest sample separation (not fitted: choose from the experimental variogram the results show).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Variogram Range Metres</em>' attribute.
	 * @see #setVariogramRangeMetres(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_VariogramRangeMetres()
	 * @model default="0.0"
	 * @generated
	 */
	double getVariogramRangeMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getVariogramRangeMetres <em>Variogram Range Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Variogram Range Metres</em>' attribute.
	 * @see #getVariogramRangeMetres()
	 * @generated
	 */
	void setVariogramRangeMetres(double value);

	/**
	 * Returns the value of the '<em><b>Delay Years</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.Double}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Delays before the remedy starts after which the enlarged zone is computed, years, increasing, each 0 to 100; none for the stated default 0, 1, 2, 5, 10.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Delay Years</em>' attribute list.
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_DelayYears()
	 * @model unique="false"
	 * @generated
	 */
	EList<Double> getDelayYears();

	/**
	 * Returns the value of the '<em><b>Transverse Dispersivity Fraction</b></em>' attribute.
	 * The default value is <code>"0.1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Transverse over longitudinal dispersivity (dimensionless), greater than 0 and at most 1; 0.1 by common practice.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Transverse Dispersivity Fraction</em>' attribute.
	 * @see #setTransverseDispersivityFraction(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_TransverseDispersivityFraction()
	 * @model default="0.1"
	 * @generated
	 */
	double getTransverseDispersivityFraction();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getTransverseDispersivityFraction <em>Transverse Dispersivity Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Transverse Dispersivity Fraction</em>' attribute.
	 * @see #getTransverseDispersivityFraction()
	 * @generated
	 */
	void setTransverseDispersivityFraction(double value);

	/**
	 * Returns the value of the '<em><b>Hot Spot Multiple</b></em>' attribute.
	 * The default value is <code>"10.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Hot spot of the hybrid alternative: soil above this multiple of the cleanup level is dug out (dimensionless), greater than 1 and at most 1,000,000.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Hot Spot Multiple</em>' attribute.
	 * @see #setHotSpotMultiple(double)
	 * @see eluvia.site.model.SitePackage#getZoneAnalysisSettings_HotSpotMultiple()
	 * @model default="10.0"
	 * @generated
	 */
	double getHotSpotMultiple();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ZoneAnalysisSettings#getHotSpotMultiple <em>Hot Spot Multiple</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Hot Spot Multiple</em>' attribute.
	 * @see #getHotSpotMultiple()
	 * @generated
	 */
	void setHotSpotMultiple(double value);

} // ZoneAnalysisSettings
