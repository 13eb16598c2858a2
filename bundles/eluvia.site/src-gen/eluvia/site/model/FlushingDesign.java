/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Flushing Design</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An in-situ flushing alternative for one treatment zone: the applied Darcy flux, the operating schedule, the share of flushed water captured and the criterion the design is held to.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.FlushingDesign#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getZone <em>Zone</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getOperatingDaysPerWeek <em>Operating Days Per Week</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getCaptureEfficiency <em>Capture Efficiency</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getCriterion <em>Criterion</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getMaxPoreVolumes <em>Max Pore Volumes</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getFlushingDesign()
 * @model
 * @generated
 */
public interface FlushingDesign extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The alternative's name.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Zone</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The treatment zone flushed.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Zone</em>' reference.
	 * @see #setZone(TreatmentZone)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_Zone()
	 * @model required="true"
	 * @generated
	 */
	TreatmentZone getZone();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getZone <em>Zone</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Zone</em>' reference.
	 * @see #getZone()
	 * @generated
	 */
	void setZone(TreatmentZone value);

	/**
	 * Returns the value of the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Applied Darcy flux q (volume of water per unit plan area per time) in m/d while operating.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Darcy Flux Metres Per Day</em>' attribute.
	 * @see #setDarcyFluxMetresPerDay(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_DarcyFluxMetresPerDay()
	 * @model
	 * @generated
	 */
	double getDarcyFluxMetresPerDay();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Darcy Flux Metres Per Day</em>' attribute.
	 * @see #getDarcyFluxMetresPerDay()
	 * @generated
	 */
	void setDarcyFluxMetresPerDay(double value);

	/**
	 * Returns the value of the '<em><b>Operating Days Per Week</b></em>' attribute.
	 * The default value is <code>"7"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Days of operation per calendar week, in (0, 7].
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Operating Days Per Week</em>' attribute.
	 * @see #setOperatingDaysPerWeek(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_OperatingDaysPerWeek()
	 * @model default="7"
	 * @generated
	 */
	double getOperatingDaysPerWeek();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getOperatingDaysPerWeek <em>Operating Days Per Week</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Operating Days Per Week</em>' attribute.
	 * @see #getOperatingDaysPerWeek()
	 * @generated
	 */
	void setOperatingDaysPerWeek(double value);

	/**
	 * Returns the value of the '<em><b>Capture Efficiency</b></em>' attribute.
	 * The default value is <code>"0.95"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Fraction of the flushed water recovered by the capture system, dimensionless, in (0, 1].
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Capture Efficiency</em>' attribute.
	 * @see #setCaptureEfficiency(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_CaptureEfficiency()
	 * @model default="0.95"
	 * @generated
	 */
	double getCaptureEfficiency();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getCaptureEfficiency <em>Capture Efficiency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Capture Efficiency</em>' attribute.
	 * @see #getCaptureEfficiency()
	 * @generated
	 */
	void setCaptureEfficiency(double value);

	/**
	 * Returns the value of the '<em><b>Criterion</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.ComplianceCriterion}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The statistic the design must bring below the cleanup level.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Criterion</em>' attribute.
	 * @see eluvia.site.model.ComplianceCriterion
	 * @see #setCriterion(ComplianceCriterion)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_Criterion()
	 * @model
	 * @generated
	 */
	ComplianceCriterion getCriterion();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getCriterion <em>Criterion</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Criterion</em>' attribute.
	 * @see eluvia.site.model.ComplianceCriterion
	 * @see #getCriterion()
	 * @generated
	 */
	void setCriterion(ComplianceCriterion value);

	/**
	 * Returns the value of the '<em><b>Max Pore Volumes</b></em>' attribute.
	 * The default value is <code>"1000"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Largest number of pore volumes (dimensionless) the search for the cleanup level may go to before it reports that the level is not reached.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Pore Volumes</em>' attribute.
	 * @see #setMaxPoreVolumes(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_MaxPoreVolumes()
	 * @model default="1000"
	 * @generated
	 */
	double getMaxPoreVolumes();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getMaxPoreVolumes <em>Max Pore Volumes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Pore Volumes</em>' attribute.
	 * @see #getMaxPoreVolumes()
	 * @generated
	 */
	void setMaxPoreVolumes(double value);

} // FlushingDesign
