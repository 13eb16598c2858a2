/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Soil Layer</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A soil layer of uniform properties between two depths below the ground surface. The retardation factor follows R = 1 + rho_b Kd / theta (Karickhoff et al. 1979 for Kd = Koc foc).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.SoilLayer#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getTopDepthMetres <em>Top Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getBottomDepthMetres <em>Bottom Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getTextureClass <em>Texture Class</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getPorosity <em>Porosity</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getWaterContent <em>Water Content</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getOrganicCarbonFraction <em>Organic Carbon Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getSaturatedConductivityMetresPerDay <em>Saturated Conductivity Metres Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getDispersivityMetres <em>Dispersivity Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getSwellFactor <em>Swell Factor</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getShrinkageFactor <em>Shrinkage Factor</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getDispersivityRule <em>Dispersivity Rule</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getDispersivityScaleMetres <em>Dispersivity Scale Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SoilLayer#getEffectiveDispersivityMetres <em>Effective Dispersivity Metres</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getSoilLayer()
 * @model
 * @generated
 */
public interface SoilLayer extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The layer's name, e.g. 'Silty sand'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Depth of the layer's top below the ground surface, in metres (0 at the surface, positive downwards).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Top Depth Metres</em>' attribute.
	 * @see #setTopDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_TopDepthMetres()
	 * @model
	 * @generated
	 */
	double getTopDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getTopDepthMetres <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Top Depth Metres</em>' attribute.
	 * @see #getTopDepthMetres()
	 * @generated
	 */
	void setTopDepthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Depth of the layer's bottom below the ground surface, in metres; greater than the top depth.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bottom Depth Metres</em>' attribute.
	 * @see #setBottomDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_BottomDepthMetres()
	 * @model
	 * @generated
	 */
	double getBottomDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getBottomDepthMetres <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bottom Depth Metres</em>' attribute.
	 * @see #getBottomDepthMetres()
	 * @generated
	 */
	void setBottomDepthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Texture Class</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Soil texture class in the user's words, e.g. 'sandy loam'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Texture Class</em>' attribute.
	 * @see #setTextureClass(String)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_TextureClass()
	 * @model
	 * @generated
	 */
	String getTextureClass();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getTextureClass <em>Texture Class</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Texture Class</em>' attribute.
	 * @see #getTextureClass()
	 * @generated
	 */
	void setTextureClass(String value);

	/**
	 * Returns the value of the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Dry bulk density rho_b in kg/m3 (1600 kg/m3 = 1.6 kg/L).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bulk Density Kg Per Cubic Metre</em>' attribute.
	 * @see #setBulkDensityKgPerCubicMetre(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_BulkDensityKgPerCubicMetre()
	 * @model
	 * @generated
	 */
	double getBulkDensityKgPerCubicMetre();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bulk Density Kg Per Cubic Metre</em>' attribute.
	 * @see #getBulkDensityKgPerCubicMetre()
	 * @generated
	 */
	void setBulkDensityKgPerCubicMetre(double value);

	/**
	 * Returns the value of the '<em><b>Porosity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Total porosity n, a dimensionless fraction in (0, 1).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Porosity</em>' attribute.
	 * @see #setPorosity(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_Porosity()
	 * @model
	 * @generated
	 */
	double getPorosity();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getPorosity <em>Porosity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Porosity</em>' attribute.
	 * @see #getPorosity()
	 * @generated
	 */
	void setPorosity(double value);

	/**
	 * Returns the value of the '<em><b>Water Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Volumetric water content theta during flushing, a dimensionless fraction (m3 water per m3 soil) in (0, porosity].
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Water Content</em>' attribute.
	 * @see #setWaterContent(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_WaterContent()
	 * @model
	 * @generated
	 */
	double getWaterContent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getWaterContent <em>Water Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Water Content</em>' attribute.
	 * @see #getWaterContent()
	 * @generated
	 */
	void setWaterContent(double value);

	/**
	 * Returns the value of the '<em><b>Organic Carbon Fraction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Fraction of organic carbon foc, dimensionless (kg organic carbon per kg dry soil), in [0, 1).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Organic Carbon Fraction</em>' attribute.
	 * @see #setOrganicCarbonFraction(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_OrganicCarbonFraction()
	 * @model
	 * @generated
	 */
	double getOrganicCarbonFraction();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getOrganicCarbonFraction <em>Organic Carbon Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Organic Carbon Fraction</em>' attribute.
	 * @see #getOrganicCarbonFraction()
	 * @generated
	 */
	void setOrganicCarbonFraction(double value);

	/**
	 * Returns the value of the '<em><b>Saturated Conductivity Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Saturated hydraulic conductivity in m/d (1 cm/s = 864 m/d).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Saturated Conductivity Metres Per Day</em>' attribute.
	 * @see #setSaturatedConductivityMetresPerDay(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_SaturatedConductivityMetresPerDay()
	 * @model
	 * @generated
	 */
	double getSaturatedConductivityMetresPerDay();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getSaturatedConductivityMetresPerDay <em>Saturated Conductivity Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Saturated Conductivity Metres Per Day</em>' attribute.
	 * @see #getSaturatedConductivityMetresPerDay()
	 * @generated
	 */
	void setSaturatedConductivityMetresPerDay(double value);

	/**
	 * Returns the value of the '<em><b>Dispersivity Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Longitudinal dispersivity alpha_L in metres (D = alpha_L v + tau D0).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Dispersivity Metres</em>' attribute.
	 * @see #setDispersivityMetres(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_DispersivityMetres()
	 * @model
	 * @generated
	 */
	double getDispersivityMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getDispersivityMetres <em>Dispersivity Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Dispersivity Metres</em>' attribute.
	 * @see #getDispersivityMetres()
	 * @generated
	 */
	void setDispersivityMetres(double value);

	/**
	 * Returns the value of the '<em><b>Swell Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Swell factor, dimensionless: loose volume = bank volume (1 + swell). E.g. 0.25 for 25 %.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Swell Factor</em>' attribute.
	 * @see #setSwellFactor(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_SwellFactor()
	 * @model
	 * @generated
	 */
	double getSwellFactor();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getSwellFactor <em>Swell Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Swell Factor</em>' attribute.
	 * @see #getSwellFactor()
	 * @generated
	 */
	void setSwellFactor(double value);

	/**
	 * Returns the value of the '<em><b>Shrinkage Factor</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Shrinkage factor, dimensionless: compacted volume = bank volume (1 - shrinkage). E.g. 0.10 for 10 %.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Shrinkage Factor</em>' attribute.
	 * @see #setShrinkageFactor(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_ShrinkageFactor()
	 * @model
	 * @generated
	 */
	double getShrinkageFactor();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getShrinkageFactor <em>Shrinkage Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Shrinkage Factor</em>' attribute.
	 * @see #getShrinkageFactor()
	 * @generated
	 */
	void setShrinkageFactor(double value);

	/**
	 * Returns the value of the '<em><b>Dispersivity Rule</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.DispersivityRule}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How the dispersivity is obtained: entered (dispersivityMetres) or derived from the flow length by a scale rule.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Dispersivity Rule</em>' attribute.
	 * @see eluvia.site.model.DispersivityRule
	 * @see #setDispersivityRule(DispersivityRule)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_DispersivityRule()
	 * @model
	 * @generated
	 */
	DispersivityRule getDispersivityRule();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getDispersivityRule <em>Dispersivity Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Dispersivity Rule</em>' attribute.
	 * @see eluvia.site.model.DispersivityRule
	 * @see #getDispersivityRule()
	 * @generated
	 */
	void setDispersivityRule(DispersivityRule value);

	/**
	 * Returns the value of the '<em><b>Dispersivity Scale Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Flow length L in metres used by a dispersivity scale rule; 0 means the layer thickness.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Dispersivity Scale Metres</em>' attribute.
	 * @see #setDispersivityScaleMetres(double)
	 * @see eluvia.site.model.SitePackage#getSoilLayer_DispersivityScaleMetres()
	 * @model
	 * @generated
	 */
	double getDispersivityScaleMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SoilLayer#getDispersivityScaleMetres <em>Dispersivity Scale Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Dispersivity Scale Metres</em>' attribute.
	 * @see #getDispersivityScaleMetres()
	 * @generated
	 */
	void setDispersivityScaleMetres(double value);

	/**
	 * Returns the value of the '<em><b>Effective Dispersivity Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The dispersivity in metres that calculations use: dispersivityMetres when entered, otherwise the scale rule applied to the flow length (see eluvia.site.derived.Dispersivities).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Effective Dispersivity Metres</em>' attribute.
	 * @see eluvia.site.model.SitePackage#getSoilLayer_EffectiveDispersivityMetres()
	 * @model transient="true" changeable="false" volatile="true" derived="true"
	 * @generated
	 */
	double getEffectiveDispersivityMetres();

} // SoilLayer
