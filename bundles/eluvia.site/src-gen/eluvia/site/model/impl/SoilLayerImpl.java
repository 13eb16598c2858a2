/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.DispersivityRule;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Soil Layer</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getTopDepthMetres <em>Top Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getBottomDepthMetres <em>Bottom Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getTextureClass <em>Texture Class</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getPorosity <em>Porosity</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getWaterContent <em>Water Content</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getOrganicCarbonFraction <em>Organic Carbon Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getSaturatedConductivityMetresPerDay <em>Saturated Conductivity Metres Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getDispersivityMetres <em>Dispersivity Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getSwellFactor <em>Swell Factor</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getShrinkageFactor <em>Shrinkage Factor</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getDispersivityRule <em>Dispersivity Rule</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getDispersivityScaleMetres <em>Dispersivity Scale Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SoilLayerImpl#getEffectiveDispersivityMetres <em>Effective Dispersivity Metres</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SoilLayerImpl extends MinimalEObjectImpl.Container implements SoilLayer {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getTopDepthMetres() <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTopDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double TOP_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTopDepthMetres() <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTopDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double topDepthMetres = TOP_DEPTH_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getBottomDepthMetres() <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBottomDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double BOTTOM_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBottomDepthMetres() <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBottomDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double bottomDepthMetres = BOTTOM_DEPTH_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getTextureClass() <em>Texture Class</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTextureClass()
	 * @generated
	 * @ordered
	 */
	protected static final String TEXTURE_CLASS_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getTextureClass() <em>Texture Class</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTextureClass()
	 * @generated
	 * @ordered
	 */
	protected String textureClass = TEXTURE_CLASS_EDEFAULT;

	/**
	 * The default value of the '{@link #getBulkDensityKgPerCubicMetre() <em>Bulk Density Kg Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBulkDensityKgPerCubicMetre()
	 * @generated
	 * @ordered
	 */
	protected static final double BULK_DENSITY_KG_PER_CUBIC_METRE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBulkDensityKgPerCubicMetre() <em>Bulk Density Kg Per Cubic Metre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBulkDensityKgPerCubicMetre()
	 * @generated
	 * @ordered
	 */
	protected double bulkDensityKgPerCubicMetre = BULK_DENSITY_KG_PER_CUBIC_METRE_EDEFAULT;

	/**
	 * The default value of the '{@link #getPorosity() <em>Porosity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPorosity()
	 * @generated
	 * @ordered
	 */
	protected static final double POROSITY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPorosity() <em>Porosity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPorosity()
	 * @generated
	 * @ordered
	 */
	protected double porosity = POROSITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getWaterContent() <em>Water Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWaterContent()
	 * @generated
	 * @ordered
	 */
	protected static final double WATER_CONTENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getWaterContent() <em>Water Content</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWaterContent()
	 * @generated
	 * @ordered
	 */
	protected double waterContent = WATER_CONTENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getOrganicCarbonFraction() <em>Organic Carbon Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrganicCarbonFraction()
	 * @generated
	 * @ordered
	 */
	protected static final double ORGANIC_CARBON_FRACTION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getOrganicCarbonFraction() <em>Organic Carbon Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrganicCarbonFraction()
	 * @generated
	 * @ordered
	 */
	protected double organicCarbonFraction = ORGANIC_CARBON_FRACTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getSaturatedConductivityMetresPerDay() <em>Saturated Conductivity Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSaturatedConductivityMetresPerDay()
	 * @generated
	 * @ordered
	 */
	protected static final double SATURATED_CONDUCTIVITY_METRES_PER_DAY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSaturatedConductivityMetresPerDay() <em>Saturated Conductivity Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSaturatedConductivityMetresPerDay()
	 * @generated
	 * @ordered
	 */
	protected double saturatedConductivityMetresPerDay = SATURATED_CONDUCTIVITY_METRES_PER_DAY_EDEFAULT;

	/**
	 * The default value of the '{@link #getDispersivityMetres() <em>Dispersivity Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDispersivityMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double DISPERSIVITY_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDispersivityMetres() <em>Dispersivity Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDispersivityMetres()
	 * @generated
	 * @ordered
	 */
	protected double dispersivityMetres = DISPERSIVITY_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getSwellFactor() <em>Swell Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSwellFactor()
	 * @generated
	 * @ordered
	 */
	protected static final double SWELL_FACTOR_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSwellFactor() <em>Swell Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSwellFactor()
	 * @generated
	 * @ordered
	 */
	protected double swellFactor = SWELL_FACTOR_EDEFAULT;

	/**
	 * The default value of the '{@link #getShrinkageFactor() <em>Shrinkage Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShrinkageFactor()
	 * @generated
	 * @ordered
	 */
	protected static final double SHRINKAGE_FACTOR_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getShrinkageFactor() <em>Shrinkage Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShrinkageFactor()
	 * @generated
	 * @ordered
	 */
	protected double shrinkageFactor = SHRINKAGE_FACTOR_EDEFAULT;

	/**
	 * The default value of the '{@link #getDispersivityRule() <em>Dispersivity Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDispersivityRule()
	 * @generated
	 * @ordered
	 */
	protected static final DispersivityRule DISPERSIVITY_RULE_EDEFAULT = DispersivityRule.ENTERED;

	/**
	 * The cached value of the '{@link #getDispersivityRule() <em>Dispersivity Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDispersivityRule()
	 * @generated
	 * @ordered
	 */
	protected DispersivityRule dispersivityRule = DISPERSIVITY_RULE_EDEFAULT;

	/**
	 * The default value of the '{@link #getDispersivityScaleMetres() <em>Dispersivity Scale Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDispersivityScaleMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double DISPERSIVITY_SCALE_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDispersivityScaleMetres() <em>Dispersivity Scale Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDispersivityScaleMetres()
	 * @generated
	 * @ordered
	 */
	protected double dispersivityScaleMetres = DISPERSIVITY_SCALE_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getEffectiveDispersivityMetres() <em>Effective Dispersivity Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEffectiveDispersivityMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double EFFECTIVE_DISPERSIVITY_METRES_EDEFAULT = 0.0;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SoilLayerImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.SOIL_LAYER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTopDepthMetres() {
		return topDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTopDepthMetres(double newTopDepthMetres) {
		double oldTopDepthMetres = topDepthMetres;
		topDepthMetres = newTopDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__TOP_DEPTH_METRES, oldTopDepthMetres, topDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBottomDepthMetres() {
		return bottomDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBottomDepthMetres(double newBottomDepthMetres) {
		double oldBottomDepthMetres = bottomDepthMetres;
		bottomDepthMetres = newBottomDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__BOTTOM_DEPTH_METRES, oldBottomDepthMetres, bottomDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getTextureClass() {
		return textureClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTextureClass(String newTextureClass) {
		String oldTextureClass = textureClass;
		textureClass = newTextureClass;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__TEXTURE_CLASS, oldTextureClass, textureClass));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBulkDensityKgPerCubicMetre() {
		return bulkDensityKgPerCubicMetre;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBulkDensityKgPerCubicMetre(double newBulkDensityKgPerCubicMetre) {
		double oldBulkDensityKgPerCubicMetre = bulkDensityKgPerCubicMetre;
		bulkDensityKgPerCubicMetre = newBulkDensityKgPerCubicMetre;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE, oldBulkDensityKgPerCubicMetre, bulkDensityKgPerCubicMetre));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPorosity() {
		return porosity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPorosity(double newPorosity) {
		double oldPorosity = porosity;
		porosity = newPorosity;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__POROSITY, oldPorosity, porosity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getWaterContent() {
		return waterContent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWaterContent(double newWaterContent) {
		double oldWaterContent = waterContent;
		waterContent = newWaterContent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__WATER_CONTENT, oldWaterContent, waterContent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOrganicCarbonFraction() {
		return organicCarbonFraction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOrganicCarbonFraction(double newOrganicCarbonFraction) {
		double oldOrganicCarbonFraction = organicCarbonFraction;
		organicCarbonFraction = newOrganicCarbonFraction;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__ORGANIC_CARBON_FRACTION, oldOrganicCarbonFraction, organicCarbonFraction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSaturatedConductivityMetresPerDay() {
		return saturatedConductivityMetresPerDay;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSaturatedConductivityMetresPerDay(double newSaturatedConductivityMetresPerDay) {
		double oldSaturatedConductivityMetresPerDay = saturatedConductivityMetresPerDay;
		saturatedConductivityMetresPerDay = newSaturatedConductivityMetresPerDay;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY, oldSaturatedConductivityMetresPerDay, saturatedConductivityMetresPerDay));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDispersivityMetres() {
		return dispersivityMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDispersivityMetres(double newDispersivityMetres) {
		double oldDispersivityMetres = dispersivityMetres;
		dispersivityMetres = newDispersivityMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__DISPERSIVITY_METRES, oldDispersivityMetres, dispersivityMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSwellFactor() {
		return swellFactor;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSwellFactor(double newSwellFactor) {
		double oldSwellFactor = swellFactor;
		swellFactor = newSwellFactor;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__SWELL_FACTOR, oldSwellFactor, swellFactor));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getShrinkageFactor() {
		return shrinkageFactor;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setShrinkageFactor(double newShrinkageFactor) {
		double oldShrinkageFactor = shrinkageFactor;
		shrinkageFactor = newShrinkageFactor;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__SHRINKAGE_FACTOR, oldShrinkageFactor, shrinkageFactor));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public DispersivityRule getDispersivityRule() {
		return dispersivityRule;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDispersivityRule(DispersivityRule newDispersivityRule) {
		DispersivityRule oldDispersivityRule = dispersivityRule;
		dispersivityRule = newDispersivityRule == null ? DISPERSIVITY_RULE_EDEFAULT : newDispersivityRule;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__DISPERSIVITY_RULE, oldDispersivityRule, dispersivityRule));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDispersivityScaleMetres() {
		return dispersivityScaleMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDispersivityScaleMetres(double newDispersivityScaleMetres) {
		double oldDispersivityScaleMetres = dispersivityScaleMetres;
		dispersivityScaleMetres = newDispersivityScaleMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOIL_LAYER__DISPERSIVITY_SCALE_METRES, oldDispersivityScaleMetres, dispersivityScaleMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEffectiveDispersivityMetres() {
		return eluvia.site.derived.Dispersivities.effectiveDispersivityMetres(this);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.SOIL_LAYER__NAME:
				return getName();
			case SitePackage.SOIL_LAYER__TOP_DEPTH_METRES:
				return getTopDepthMetres();
			case SitePackage.SOIL_LAYER__BOTTOM_DEPTH_METRES:
				return getBottomDepthMetres();
			case SitePackage.SOIL_LAYER__TEXTURE_CLASS:
				return getTextureClass();
			case SitePackage.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE:
				return getBulkDensityKgPerCubicMetre();
			case SitePackage.SOIL_LAYER__POROSITY:
				return getPorosity();
			case SitePackage.SOIL_LAYER__WATER_CONTENT:
				return getWaterContent();
			case SitePackage.SOIL_LAYER__ORGANIC_CARBON_FRACTION:
				return getOrganicCarbonFraction();
			case SitePackage.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY:
				return getSaturatedConductivityMetresPerDay();
			case SitePackage.SOIL_LAYER__DISPERSIVITY_METRES:
				return getDispersivityMetres();
			case SitePackage.SOIL_LAYER__SWELL_FACTOR:
				return getSwellFactor();
			case SitePackage.SOIL_LAYER__SHRINKAGE_FACTOR:
				return getShrinkageFactor();
			case SitePackage.SOIL_LAYER__DISPERSIVITY_RULE:
				return getDispersivityRule();
			case SitePackage.SOIL_LAYER__DISPERSIVITY_SCALE_METRES:
				return getDispersivityScaleMetres();
			case SitePackage.SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES:
				return getEffectiveDispersivityMetres();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.SOIL_LAYER__NAME:
				setName((String)newValue);
				return;
			case SitePackage.SOIL_LAYER__TOP_DEPTH_METRES:
				setTopDepthMetres((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__BOTTOM_DEPTH_METRES:
				setBottomDepthMetres((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__TEXTURE_CLASS:
				setTextureClass((String)newValue);
				return;
			case SitePackage.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE:
				setBulkDensityKgPerCubicMetre((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__POROSITY:
				setPorosity((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__WATER_CONTENT:
				setWaterContent((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__ORGANIC_CARBON_FRACTION:
				setOrganicCarbonFraction((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY:
				setSaturatedConductivityMetresPerDay((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_METRES:
				setDispersivityMetres((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__SWELL_FACTOR:
				setSwellFactor((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__SHRINKAGE_FACTOR:
				setShrinkageFactor((Double)newValue);
				return;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_RULE:
				setDispersivityRule((DispersivityRule)newValue);
				return;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_SCALE_METRES:
				setDispersivityScaleMetres((Double)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case SitePackage.SOIL_LAYER__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__TOP_DEPTH_METRES:
				setTopDepthMetres(TOP_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__BOTTOM_DEPTH_METRES:
				setBottomDepthMetres(BOTTOM_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__TEXTURE_CLASS:
				setTextureClass(TEXTURE_CLASS_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE:
				setBulkDensityKgPerCubicMetre(BULK_DENSITY_KG_PER_CUBIC_METRE_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__POROSITY:
				setPorosity(POROSITY_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__WATER_CONTENT:
				setWaterContent(WATER_CONTENT_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__ORGANIC_CARBON_FRACTION:
				setOrganicCarbonFraction(ORGANIC_CARBON_FRACTION_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY:
				setSaturatedConductivityMetresPerDay(SATURATED_CONDUCTIVITY_METRES_PER_DAY_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_METRES:
				setDispersivityMetres(DISPERSIVITY_METRES_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__SWELL_FACTOR:
				setSwellFactor(SWELL_FACTOR_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__SHRINKAGE_FACTOR:
				setShrinkageFactor(SHRINKAGE_FACTOR_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_RULE:
				setDispersivityRule(DISPERSIVITY_RULE_EDEFAULT);
				return;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_SCALE_METRES:
				setDispersivityScaleMetres(DISPERSIVITY_SCALE_METRES_EDEFAULT);
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case SitePackage.SOIL_LAYER__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.SOIL_LAYER__TOP_DEPTH_METRES:
				return topDepthMetres != TOP_DEPTH_METRES_EDEFAULT;
			case SitePackage.SOIL_LAYER__BOTTOM_DEPTH_METRES:
				return bottomDepthMetres != BOTTOM_DEPTH_METRES_EDEFAULT;
			case SitePackage.SOIL_LAYER__TEXTURE_CLASS:
				return TEXTURE_CLASS_EDEFAULT == null ? textureClass != null : !TEXTURE_CLASS_EDEFAULT.equals(textureClass);
			case SitePackage.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE:
				return bulkDensityKgPerCubicMetre != BULK_DENSITY_KG_PER_CUBIC_METRE_EDEFAULT;
			case SitePackage.SOIL_LAYER__POROSITY:
				return porosity != POROSITY_EDEFAULT;
			case SitePackage.SOIL_LAYER__WATER_CONTENT:
				return waterContent != WATER_CONTENT_EDEFAULT;
			case SitePackage.SOIL_LAYER__ORGANIC_CARBON_FRACTION:
				return organicCarbonFraction != ORGANIC_CARBON_FRACTION_EDEFAULT;
			case SitePackage.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY:
				return saturatedConductivityMetresPerDay != SATURATED_CONDUCTIVITY_METRES_PER_DAY_EDEFAULT;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_METRES:
				return dispersivityMetres != DISPERSIVITY_METRES_EDEFAULT;
			case SitePackage.SOIL_LAYER__SWELL_FACTOR:
				return swellFactor != SWELL_FACTOR_EDEFAULT;
			case SitePackage.SOIL_LAYER__SHRINKAGE_FACTOR:
				return shrinkageFactor != SHRINKAGE_FACTOR_EDEFAULT;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_RULE:
				return dispersivityRule != DISPERSIVITY_RULE_EDEFAULT;
			case SitePackage.SOIL_LAYER__DISPERSIVITY_SCALE_METRES:
				return dispersivityScaleMetres != DISPERSIVITY_SCALE_METRES_EDEFAULT;
			case SitePackage.SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES:
				return getEffectiveDispersivityMetres() != EFFECTIVE_DISPERSIVITY_METRES_EDEFAULT;
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (name: ");
		result.append(name);
		result.append(", topDepthMetres: ");
		result.append(topDepthMetres);
		result.append(", bottomDepthMetres: ");
		result.append(bottomDepthMetres);
		result.append(", textureClass: ");
		result.append(textureClass);
		result.append(", bulkDensityKgPerCubicMetre: ");
		result.append(bulkDensityKgPerCubicMetre);
		result.append(", porosity: ");
		result.append(porosity);
		result.append(", waterContent: ");
		result.append(waterContent);
		result.append(", organicCarbonFraction: ");
		result.append(organicCarbonFraction);
		result.append(", saturatedConductivityMetresPerDay: ");
		result.append(saturatedConductivityMetresPerDay);
		result.append(", dispersivityMetres: ");
		result.append(dispersivityMetres);
		result.append(", swellFactor: ");
		result.append(swellFactor);
		result.append(", shrinkageFactor: ");
		result.append(shrinkageFactor);
		result.append(", dispersivityRule: ");
		result.append(dispersivityRule);
		result.append(", dispersivityScaleMetres: ");
		result.append(dispersivityScaleMetres);
		result.append(')');
		return result.toString();
	}

} //SoilLayerImpl
