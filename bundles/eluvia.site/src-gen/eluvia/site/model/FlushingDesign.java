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
 *   <li>{@link eluvia.site.model.FlushingDesign#getSolutionMethod <em>Solution Method</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getNumericalCellCount <em>Numerical Cell Count</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getNumericalRelativeTolerance <em>Numerical Relative Tolerance</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getMonitoringIntervalDays <em>Monitoring Interval Days</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getAmendmentName <em>Amendment Name</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getAmendmentDoseKilogramsPerCubicMetre <em>Amendment Dose Kilograms Per Cubic Metre</em>}</li>
 *   <li>{@link eluvia.site.model.FlushingDesign#getPriceBook <em>Price Book</em>}</li>
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

	/**
	 * Returns the value of the '<em><b>Solution Method</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.SolutionMethod}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Which solution computes the flushing: equilibrium analytical, two-region nonequilibrium, or numerical.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Solution Method</em>' attribute.
	 * @see eluvia.site.model.SolutionMethod
	 * @see #setSolutionMethod(SolutionMethod)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_SolutionMethod()
	 * @model
	 * @generated
	 */
	SolutionMethod getSolutionMethod();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getSolutionMethod <em>Solution Method</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Solution Method</em>' attribute.
	 * @see eluvia.site.model.SolutionMethod
	 * @see #getSolutionMethod()
	 * @generated
	 */
	void setSolutionMethod(SolutionMethod value);

	/**
	 * Returns the value of the '<em><b>Numerical Cell Count</b></em>' attribute.
	 * The default value is <code>"200"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Numerical solution: number of cells over the zone depth (a count).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Numerical Cell Count</em>' attribute.
	 * @see #setNumericalCellCount(int)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_NumericalCellCount()
	 * @model default="200"
	 * @generated
	 */
	int getNumericalCellCount();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getNumericalCellCount <em>Numerical Cell Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Numerical Cell Count</em>' attribute.
	 * @see #getNumericalCellCount()
	 * @generated
	 */
	void setNumericalCellCount(int value);

	/**
	 * Returns the value of the '<em><b>Numerical Relative Tolerance</b></em>' attribute.
	 * The default value is <code>"1.0E-6"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Numerical solution: relative accuracy of the time integration, dimensionless.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Numerical Relative Tolerance</em>' attribute.
	 * @see #setNumericalRelativeTolerance(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_NumericalRelativeTolerance()
	 * @model default="1.0E-6"
	 * @generated
	 */
	double getNumericalRelativeTolerance();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getNumericalRelativeTolerance <em>Numerical Relative Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Numerical Relative Tolerance</em>' attribute.
	 * @see #getNumericalRelativeTolerance()
	 * @generated
	 */
	void setNumericalRelativeTolerance(double value);

	/**
	 * Returns the value of the '<em><b>Monitoring Interval Days</b></em>' attribute.
	 * The default value is <code>"7"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Days between effluent samplings during operation.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Monitoring Interval Days</em>' attribute.
	 * @see #setMonitoringIntervalDays(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_MonitoringIntervalDays()
	 * @model default="7"
	 * @generated
	 */
	double getMonitoringIntervalDays();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getMonitoringIntervalDays <em>Monitoring Interval Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Monitoring Interval Days</em>' attribute.
	 * @see #getMonitoringIntervalDays()
	 * @generated
	 */
	void setMonitoringIntervalDays(double value);

	/**
	 * Returns the value of the '<em><b>Amendment Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Name of the flushing amendment (surfactant, cosolvent, ...); empty for plain water.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Amendment Name</em>' attribute.
	 * @see #setAmendmentName(String)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_AmendmentName()
	 * @model
	 * @generated
	 */
	String getAmendmentName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getAmendmentName <em>Amendment Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Amendment Name</em>' attribute.
	 * @see #getAmendmentName()
	 * @generated
	 */
	void setAmendmentName(String value);

	/**
	 * Returns the value of the '<em><b>Amendment Dose Kilograms Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Amendment dose in kg per m3 of flushing solution; 0 for plain water.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Amendment Dose Kilograms Per Cubic Metre</em>' attribute.
	 * @see #setAmendmentDoseKilogramsPerCubicMetre(double)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_AmendmentDoseKilogramsPerCubicMetre()
	 * @model
	 * @generated
	 */
	double getAmendmentDoseKilogramsPerCubicMetre();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getAmendmentDoseKilogramsPerCubicMetre <em>Amendment Dose Kilograms Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Amendment Dose Kilograms Per Cubic Metre</em>' attribute.
	 * @see #getAmendmentDoseKilogramsPerCubicMetre()
	 * @generated
	 */
	void setAmendmentDoseKilogramsPerCubicMetre(double value);

	/**
	 * Returns the value of the '<em><b>Price Book</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The price book whose rates cost this alternative.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Price Book</em>' reference.
	 * @see #setPriceBook(PriceBook)
	 * @see eluvia.site.model.SitePackage#getFlushingDesign_PriceBook()
	 * @model
	 * @generated
	 */
	PriceBook getPriceBook();

	/**
	 * Sets the value of the '{@link eluvia.site.model.FlushingDesign#getPriceBook <em>Price Book</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Price Book</em>' reference.
	 * @see #getPriceBook()
	 * @generated
	 */
	void setPriceBook(PriceBook value);

} // FlushingDesign
