/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Column Test</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A laboratory column test of one contaminant in soil of one layer: the measured breakthrough or elution curve and the column's conditions.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.ColumnTest#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getLayer <em>Layer</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getKind <em>Kind</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getColumnLengthMetres <em>Column Length Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getWaterContent <em>Water Content</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getReferenceConcentrationMilligramsPerLitre <em>Reference Concentration Milligrams Per Litre</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTest#getPoints <em>Points</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getColumnTest()
 * @model
 * @generated
 */
public interface ColumnTest extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The test's name or laboratory identifier.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getColumnTest_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminant.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contaminant</em>' reference.
	 * @see #setContaminant(Contaminant)
	 * @see eluvia.site.model.SitePackage#getColumnTest_Contaminant()
	 * @model required="true"
	 * @generated
	 */
	Contaminant getContaminant();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getContaminant <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Contaminant</em>' reference.
	 * @see #getContaminant()
	 * @generated
	 */
	void setContaminant(Contaminant value);

	/**
	 * Returns the value of the '<em><b>Layer</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The soil layer the column was packed from.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Layer</em>' reference.
	 * @see #setLayer(SoilLayer)
	 * @see eluvia.site.model.SitePackage#getColumnTest_Layer()
	 * @model
	 * @generated
	 */
	SoilLayer getLayer();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getLayer <em>Layer</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Layer</em>' reference.
	 * @see #getLayer()
	 * @generated
	 */
	void setLayer(SoilLayer value);

	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.ColumnTestKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Breakthrough (clean column, contaminated feed) or elution (contaminated column, clean feed).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see eluvia.site.model.ColumnTestKind
	 * @see #setKind(ColumnTestKind)
	 * @see eluvia.site.model.SitePackage#getColumnTest_Kind()
	 * @model
	 * @generated
	 */
	ColumnTestKind getKind();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see eluvia.site.model.ColumnTestKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(ColumnTestKind value);

	/**
	 * Returns the value of the '<em><b>Column Length Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Length of the soil column in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Column Length Metres</em>' attribute.
	 * @see #setColumnLengthMetres(double)
	 * @see eluvia.site.model.SitePackage#getColumnTest_ColumnLengthMetres()
	 * @model
	 * @generated
	 */
	double getColumnLengthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getColumnLengthMetres <em>Column Length Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Column Length Metres</em>' attribute.
	 * @see #getColumnLengthMetres()
	 * @generated
	 */
	void setColumnLengthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Darcy flux through the column in m/d.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Darcy Flux Metres Per Day</em>' attribute.
	 * @see #setDarcyFluxMetresPerDay(double)
	 * @see eluvia.site.model.SitePackage#getColumnTest_DarcyFluxMetresPerDay()
	 * @model
	 * @generated
	 */
	double getDarcyFluxMetresPerDay();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Darcy Flux Metres Per Day</em>' attribute.
	 * @see #getDarcyFluxMetresPerDay()
	 * @generated
	 */
	void setDarcyFluxMetresPerDay(double value);

	/**
	 * Returns the value of the '<em><b>Water Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Volumetric water content of the column, dimensionless.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Water Content</em>' attribute.
	 * @see #setWaterContent(double)
	 * @see eluvia.site.model.SitePackage#getColumnTest_WaterContent()
	 * @model
	 * @generated
	 */
	double getWaterContent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getWaterContent <em>Water Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Water Content</em>' attribute.
	 * @see #getWaterContent()
	 * @generated
	 */
	void setWaterContent(double value);

	/**
	 * Returns the value of the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Dry bulk density of the column in kg/m3.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bulk Density Kg Per Cubic Metre</em>' attribute.
	 * @see #setBulkDensityKgPerCubicMetre(double)
	 * @see eluvia.site.model.SitePackage#getColumnTest_BulkDensityKgPerCubicMetre()
	 * @model
	 * @generated
	 */
	double getBulkDensityKgPerCubicMetre();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bulk Density Kg Per Cubic Metre</em>' attribute.
	 * @see #getBulkDensityKgPerCubicMetre()
	 * @generated
	 */
	void setBulkDensityKgPerCubicMetre(double value);

	/**
	 * Returns the value of the '<em><b>Reference Concentration Milligrams Per Litre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * C0 in mg/L: the feed concentration (breakthrough) or the initial pore-water concentration (elution).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reference Concentration Milligrams Per Litre</em>' attribute.
	 * @see #setReferenceConcentrationMilligramsPerLitre(double)
	 * @see eluvia.site.model.SitePackage#getColumnTest_ReferenceConcentrationMilligramsPerLitre()
	 * @model
	 * @generated
	 */
	double getReferenceConcentrationMilligramsPerLitre();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTest#getReferenceConcentrationMilligramsPerLitre <em>Reference Concentration Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reference Concentration Milligrams Per Litre</em>' attribute.
	 * @see #getReferenceConcentrationMilligramsPerLitre()
	 * @generated
	 */
	void setReferenceConcentrationMilligramsPerLitre(double value);

	/**
	 * Returns the value of the '<em><b>Points</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.ColumnTestPoint}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Measured points, in increasing pore volumes.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Points</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getColumnTest_Points()
	 * @model containment="true"
	 * @generated
	 */
	EList<ColumnTestPoint> getPoints();

} // ColumnTest
