/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Uncertain Input</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One uncertain input: a double attribute of an object of this project (its target and featureName, e.g. a soil layer's porosity or a flushing design's darcyFluxMetresPerDay) and the distribution it is drawn from. Every parameter is in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction); only the parameters of the chosen distribution are used.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.UncertainInput#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getTarget <em>Target</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getFeatureName <em>Feature Name</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getDistribution <em>Distribution</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getMeanInFeatureUnit <em>Mean In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getStandardDeviationInFeatureUnit <em>Standard Deviation In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getMedianInFeatureUnit <em>Median In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getGeometricStandardDeviation <em>Geometric Standard Deviation</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getMinimumInFeatureUnit <em>Minimum In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getModeInFeatureUnit <em>Mode In Feature Unit</em>}</li>
 *   <li>{@link eluvia.site.model.UncertainInput#getMaximumInFeatureUnit <em>Maximum In Feature Unit</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getUncertainInput()
 * @model
 * @generated
 */
public interface UncertainInput extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Optional label used in results; empty gives one made from the target and the feature.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Target</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The object of this project whose attribute varies.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Target</em>' reference.
	 * @see #setTarget(EObject)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_Target()
	 * @model
	 * @generated
	 */
	EObject getTarget();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getTarget <em>Target</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Target</em>' reference.
	 * @see #getTarget()
	 * @generated
	 */
	void setTarget(EObject value);

	/**
	 * Returns the value of the '<em><b>Feature Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The name of the double attribute of the target that varies, e.g. porosity, kocLitresPerKg, darcyFluxMetresPerDay, ratePerUnit, soilConcentrationMilligramsPerKg.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Feature Name</em>' attribute.
	 * @see #setFeatureName(String)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_FeatureName()
	 * @model
	 * @generated
	 */
	String getFeatureName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getFeatureName <em>Feature Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Feature Name</em>' attribute.
	 * @see #getFeatureName()
	 * @generated
	 */
	void setFeatureName(String value);

	/**
	 * Returns the value of the '<em><b>Distribution</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.InputDistributionKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The distribution the input is drawn from.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Distribution</em>' attribute.
	 * @see eluvia.site.model.InputDistributionKind
	 * @see #setDistribution(InputDistributionKind)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_Distribution()
	 * @model
	 * @generated
	 */
	InputDistributionKind getDistribution();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getDistribution <em>Distribution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Distribution</em>' attribute.
	 * @see eluvia.site.model.InputDistributionKind
	 * @see #getDistribution()
	 * @generated
	 */
	void setDistribution(InputDistributionKind value);

	/**
	 * Returns the value of the '<em><b>Mean In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Normal: the mean, in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Mean In Feature Unit</em>' attribute.
	 * @see #setMeanInFeatureUnit(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_MeanInFeatureUnit()
	 * @model
	 * @generated
	 */
	double getMeanInFeatureUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getMeanInFeatureUnit <em>Mean In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Mean In Feature Unit</em>' attribute.
	 * @see #getMeanInFeatureUnit()
	 * @generated
	 */
	void setMeanInFeatureUnit(double value);

	/**
	 * Returns the value of the '<em><b>Standard Deviation In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Normal: the standard deviation (greater than 0), in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Standard Deviation In Feature Unit</em>' attribute.
	 * @see #setStandardDeviationInFeatureUnit(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_StandardDeviationInFeatureUnit()
	 * @model
	 * @generated
	 */
	double getStandardDeviationInFeatureUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getStandardDeviationInFeatureUnit <em>Standard Deviation In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Standard Deviation In Feature Unit</em>' attribute.
	 * @see #getStandardDeviationInFeatureUnit()
	 * @generated
	 */
	void setStandardDeviationInFeatureUnit(double value);

	/**
	 * Returns the value of the '<em><b>Median In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lognormal: the median (greater than 0), in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Median In Feature Unit</em>' attribute.
	 * @see #setMedianInFeatureUnit(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_MedianInFeatureUnit()
	 * @model
	 * @generated
	 */
	double getMedianInFeatureUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getMedianInFeatureUnit <em>Median In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Median In Feature Unit</em>' attribute.
	 * @see #getMedianInFeatureUnit()
	 * @generated
	 */
	void setMedianInFeatureUnit(double value);

	/**
	 * Returns the value of the '<em><b>Geometric Standard Deviation</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lognormal: the geometric standard deviation exp(sigma of ln x), dimensionless, greater than 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Geometric Standard Deviation</em>' attribute.
	 * @see #setGeometricStandardDeviation(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_GeometricStandardDeviation()
	 * @model default="1"
	 * @generated
	 */
	double getGeometricStandardDeviation();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getGeometricStandardDeviation <em>Geometric Standard Deviation</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Geometric Standard Deviation</em>' attribute.
	 * @see #getGeometricStandardDeviation()
	 * @generated
	 */
	void setGeometricStandardDeviation(double value);

	/**
	 * Returns the value of the '<em><b>Minimum In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Uniform and triangular: the smallest value, in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Minimum In Feature Unit</em>' attribute.
	 * @see #setMinimumInFeatureUnit(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_MinimumInFeatureUnit()
	 * @model
	 * @generated
	 */
	double getMinimumInFeatureUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getMinimumInFeatureUnit <em>Minimum In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Minimum In Feature Unit</em>' attribute.
	 * @see #getMinimumInFeatureUnit()
	 * @generated
	 */
	void setMinimumInFeatureUnit(double value);

	/**
	 * Returns the value of the '<em><b>Mode In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Triangular: the most likely value, from the minimum to the maximum, in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Mode In Feature Unit</em>' attribute.
	 * @see #setModeInFeatureUnit(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_ModeInFeatureUnit()
	 * @model
	 * @generated
	 */
	double getModeInFeatureUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getModeInFeatureUnit <em>Mode In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Mode In Feature Unit</em>' attribute.
	 * @see #getModeInFeatureUnit()
	 * @generated
	 */
	void setModeInFeatureUnit(double value);

	/**
	 * Returns the value of the '<em><b>Maximum In Feature Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Uniform and triangular: the largest value (greater than the minimum), in the SI unit of the target feature (the unit its name states, e.g. m/d for darcyFluxMetresPerDay; dimensionless for a fraction).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Maximum In Feature Unit</em>' attribute.
	 * @see #setMaximumInFeatureUnit(double)
	 * @see eluvia.site.model.SitePackage#getUncertainInput_MaximumInFeatureUnit()
	 * @model
	 * @generated
	 */
	double getMaximumInFeatureUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertainInput#getMaximumInFeatureUnit <em>Maximum In Feature Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Maximum In Feature Unit</em>' attribute.
	 * @see #getMaximumInFeatureUnit()
	 * @generated
	 */
	void setMaximumInFeatureUnit(double value);

} // UncertainInput
