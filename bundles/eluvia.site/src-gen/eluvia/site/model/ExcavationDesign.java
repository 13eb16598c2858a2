/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Excavation Design</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An excavation alternative for one treatment zone: pit geometry rules and hauling.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getZone <em>Zone</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getSoilType <em>Soil Type</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getSideSlopeHorizontalPerVertical <em>Side Slope Horizontal Per Vertical</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getOverdigMetres <em>Overdig Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getTruckHeapedCapacityCubicMetres <em>Truck Heaped Capacity Cubic Metres</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getTruckPayloadKilograms <em>Truck Payload Kilograms</em>}</li>
 *   <li>{@link eluvia.site.model.ExcavationDesign#getPriceBook <em>Price Book</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getExcavationDesign()
 * @model
 * @generated
 */
public interface ExcavationDesign extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The alternative's name.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getName <em>Name</em>}' attribute.
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
	 * The treatment zone dug out.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Zone</em>' reference.
	 * @see #setZone(TreatmentZone)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_Zone()
	 * @model required="true"
	 * @generated
	 */
	TreatmentZone getZone();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getZone <em>Zone</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Zone</em>' reference.
	 * @see #getZone()
	 * @generated
	 */
	void setZone(TreatmentZone value);

	/**
	 * Returns the value of the '<em><b>Soil Type</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.ExcavationSoilType}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Soil class for the side slopes (US OSHA 29 CFR 1926 Subpart P, App. A/B); defer to the rules where the site is.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Soil Type</em>' attribute.
	 * @see eluvia.site.model.ExcavationSoilType
	 * @see #setSoilType(ExcavationSoilType)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_SoilType()
	 * @model
	 * @generated
	 */
	ExcavationSoilType getSoilType();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getSoilType <em>Soil Type</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Soil Type</em>' attribute.
	 * @see eluvia.site.model.ExcavationSoilType
	 * @see #getSoilType()
	 * @generated
	 */
	void setSoilType(ExcavationSoilType value);

	/**
	 * Returns the value of the '<em><b>Side Slope Horizontal Per Vertical</b></em>' attribute.
	 * The default value is <code>"1.5"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Side slope as horizontal distance per unit of depth (dimensionless, H:V); 0 is vertical.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Side Slope Horizontal Per Vertical</em>' attribute.
	 * @see #setSideSlopeHorizontalPerVertical(double)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_SideSlopeHorizontalPerVertical()
	 * @model default="1.5"
	 * @generated
	 */
	double getSideSlopeHorizontalPerVertical();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getSideSlopeHorizontalPerVertical <em>Side Slope Horizontal Per Vertical</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Side Slope Horizontal Per Vertical</em>' attribute.
	 * @see #getSideSlopeHorizontalPerVertical()
	 * @generated
	 */
	void setSideSlopeHorizontalPerVertical(double value);

	/**
	 * Returns the value of the '<em><b>Overdig Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Extra depth and width dug beyond the zone on every face, in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Overdig Metres</em>' attribute.
	 * @see #setOverdigMetres(double)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_OverdigMetres()
	 * @model
	 * @generated
	 */
	double getOverdigMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getOverdigMetres <em>Overdig Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Overdig Metres</em>' attribute.
	 * @see #getOverdigMetres()
	 * @generated
	 */
	void setOverdigMetres(double value);

	/**
	 * Returns the value of the '<em><b>Truck Heaped Capacity Cubic Metres</b></em>' attribute.
	 * The default value is <code>"15"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Heaped capacity of one truck in m3 of loose material.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Truck Heaped Capacity Cubic Metres</em>' attribute.
	 * @see #setTruckHeapedCapacityCubicMetres(double)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_TruckHeapedCapacityCubicMetres()
	 * @model default="15"
	 * @generated
	 */
	double getTruckHeapedCapacityCubicMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getTruckHeapedCapacityCubicMetres <em>Truck Heaped Capacity Cubic Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Truck Heaped Capacity Cubic Metres</em>' attribute.
	 * @see #getTruckHeapedCapacityCubicMetres()
	 * @generated
	 */
	void setTruckHeapedCapacityCubicMetres(double value);

	/**
	 * Returns the value of the '<em><b>Truck Payload Kilograms</b></em>' attribute.
	 * The default value is <code>"20000"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Legal payload of one truck in kg.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Truck Payload Kilograms</em>' attribute.
	 * @see #setTruckPayloadKilograms(double)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_TruckPayloadKilograms()
	 * @model default="20000"
	 * @generated
	 */
	double getTruckPayloadKilograms();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getTruckPayloadKilograms <em>Truck Payload Kilograms</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Truck Payload Kilograms</em>' attribute.
	 * @see #getTruckPayloadKilograms()
	 * @generated
	 */
	void setTruckPayloadKilograms(double value);

	/**
	 * Returns the value of the '<em><b>Price Book</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The price book whose rates cost this alternative.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Price Book</em>' reference.
	 * @see #setPriceBook(PriceBook)
	 * @see eluvia.site.model.SitePackage#getExcavationDesign_PriceBook()
	 * @model
	 * @generated
	 */
	PriceBook getPriceBook();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ExcavationDesign#getPriceBook <em>Price Book</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Price Book</em>' reference.
	 * @see #getPriceBook()
	 * @generated
	 */
	void setPriceBook(PriceBook value);

} // ExcavationDesign
