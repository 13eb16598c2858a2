/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.NonDetectValue;
import eluvia.site.model.SitePackage;
import eluvia.site.model.VariogramShapeKind;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EDataTypeEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Zone Analysis Settings</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getEstimator <em>Estimator</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getNonDetectRule <em>Non Detect Rule</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getInverseDistancePower <em>Inverse Distance Power</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getMaximumNeighbours <em>Maximum Neighbours</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getSearchRadiusMetres <em>Search Radius Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getVerticalDistanceFactor <em>Vertical Distance Factor</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getBlockPlanSizeMetres <em>Block Plan Size Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getBlockDepthMetres <em>Block Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getVariogramModel <em>Variogram Model</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getVariogramNuggetMgPerKgSquared <em>Variogram Nugget Mg Per Kg Squared</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getVariogramSillMgPerKgSquared <em>Variogram Sill Mg Per Kg Squared</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getVariogramRangeMetres <em>Variogram Range Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getDelayYears <em>Delay Years</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getTransverseDispersivityFraction <em>Transverse Dispersivity Fraction</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ZoneAnalysisSettingsImpl#getHotSpotMultiple <em>Hot Spot Multiple</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ZoneAnalysisSettingsImpl extends MinimalEObjectImpl.Container implements ZoneAnalysisSettings {
	/**
	 * The default value of the '{@link #getEstimator() <em>Estimator</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEstimator()
	 * @generated
	 * @ordered
	 */
	protected static final ZoneEstimatorKind ESTIMATOR_EDEFAULT = ZoneEstimatorKind.INVERSE_DISTANCE;

	/**
	 * The cached value of the '{@link #getEstimator() <em>Estimator</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEstimator()
	 * @generated
	 * @ordered
	 */
	protected ZoneEstimatorKind estimator = ESTIMATOR_EDEFAULT;

	/**
	 * The default value of the '{@link #getNonDetectRule() <em>Non Detect Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNonDetectRule()
	 * @generated
	 * @ordered
	 */
	protected static final NonDetectValue NON_DETECT_RULE_EDEFAULT = NonDetectValue.HALF_DETECTION_LIMIT;

	/**
	 * The cached value of the '{@link #getNonDetectRule() <em>Non Detect Rule</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNonDetectRule()
	 * @generated
	 * @ordered
	 */
	protected NonDetectValue nonDetectRule = NON_DETECT_RULE_EDEFAULT;

	/**
	 * The default value of the '{@link #getInverseDistancePower() <em>Inverse Distance Power</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInverseDistancePower()
	 * @generated
	 * @ordered
	 */
	protected static final double INVERSE_DISTANCE_POWER_EDEFAULT = 2.0;

	/**
	 * The cached value of the '{@link #getInverseDistancePower() <em>Inverse Distance Power</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInverseDistancePower()
	 * @generated
	 * @ordered
	 */
	protected double inverseDistancePower = INVERSE_DISTANCE_POWER_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaximumNeighbours() <em>Maximum Neighbours</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumNeighbours()
	 * @generated
	 * @ordered
	 */
	protected static final int MAXIMUM_NEIGHBOURS_EDEFAULT = 16;

	/**
	 * The cached value of the '{@link #getMaximumNeighbours() <em>Maximum Neighbours</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximumNeighbours()
	 * @generated
	 * @ordered
	 */
	protected int maximumNeighbours = MAXIMUM_NEIGHBOURS_EDEFAULT;

	/**
	 * The default value of the '{@link #getSearchRadiusMetres() <em>Search Radius Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSearchRadiusMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double SEARCH_RADIUS_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSearchRadiusMetres() <em>Search Radius Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSearchRadiusMetres()
	 * @generated
	 * @ordered
	 */
	protected double searchRadiusMetres = SEARCH_RADIUS_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getVerticalDistanceFactor() <em>Vertical Distance Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVerticalDistanceFactor()
	 * @generated
	 * @ordered
	 */
	protected static final double VERTICAL_DISTANCE_FACTOR_EDEFAULT = 10.0;

	/**
	 * The cached value of the '{@link #getVerticalDistanceFactor() <em>Vertical Distance Factor</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVerticalDistanceFactor()
	 * @generated
	 * @ordered
	 */
	protected double verticalDistanceFactor = VERTICAL_DISTANCE_FACTOR_EDEFAULT;

	/**
	 * The default value of the '{@link #getBlockPlanSizeMetres() <em>Block Plan Size Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBlockPlanSizeMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double BLOCK_PLAN_SIZE_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBlockPlanSizeMetres() <em>Block Plan Size Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBlockPlanSizeMetres()
	 * @generated
	 * @ordered
	 */
	protected double blockPlanSizeMetres = BLOCK_PLAN_SIZE_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getBlockDepthMetres() <em>Block Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBlockDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double BLOCK_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBlockDepthMetres() <em>Block Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBlockDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double blockDepthMetres = BLOCK_DEPTH_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getVariogramModel() <em>Variogram Model</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramModel()
	 * @generated
	 * @ordered
	 */
	protected static final VariogramShapeKind VARIOGRAM_MODEL_EDEFAULT = VariogramShapeKind.SPHERICAL;

	/**
	 * The cached value of the '{@link #getVariogramModel() <em>Variogram Model</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramModel()
	 * @generated
	 * @ordered
	 */
	protected VariogramShapeKind variogramModel = VARIOGRAM_MODEL_EDEFAULT;

	/**
	 * The default value of the '{@link #getVariogramNuggetMgPerKgSquared() <em>Variogram Nugget Mg Per Kg Squared</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramNuggetMgPerKgSquared()
	 * @generated
	 * @ordered
	 */
	protected static final double VARIOGRAM_NUGGET_MG_PER_KG_SQUARED_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVariogramNuggetMgPerKgSquared() <em>Variogram Nugget Mg Per Kg Squared</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramNuggetMgPerKgSquared()
	 * @generated
	 * @ordered
	 */
	protected double variogramNuggetMgPerKgSquared = VARIOGRAM_NUGGET_MG_PER_KG_SQUARED_EDEFAULT;

	/**
	 * The default value of the '{@link #getVariogramSillMgPerKgSquared() <em>Variogram Sill Mg Per Kg Squared</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramSillMgPerKgSquared()
	 * @generated
	 * @ordered
	 */
	protected static final double VARIOGRAM_SILL_MG_PER_KG_SQUARED_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVariogramSillMgPerKgSquared() <em>Variogram Sill Mg Per Kg Squared</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramSillMgPerKgSquared()
	 * @generated
	 * @ordered
	 */
	protected double variogramSillMgPerKgSquared = VARIOGRAM_SILL_MG_PER_KG_SQUARED_EDEFAULT;

	/**
	 * The default value of the '{@link #getVariogramRangeMetres() <em>Variogram Range Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramRangeMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double VARIOGRAM_RANGE_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVariogramRangeMetres() <em>Variogram Range Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariogramRangeMetres()
	 * @generated
	 * @ordered
	 */
	protected double variogramRangeMetres = VARIOGRAM_RANGE_METRES_EDEFAULT;

	/**
	 * The cached value of the '{@link #getDelayYears() <em>Delay Years</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDelayYears()
	 * @generated
	 * @ordered
	 */
	protected EList<Double> delayYears;

	/**
	 * The default value of the '{@link #getTransverseDispersivityFraction() <em>Transverse Dispersivity Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTransverseDispersivityFraction()
	 * @generated
	 * @ordered
	 */
	protected static final double TRANSVERSE_DISPERSIVITY_FRACTION_EDEFAULT = 0.1;

	/**
	 * The cached value of the '{@link #getTransverseDispersivityFraction() <em>Transverse Dispersivity Fraction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTransverseDispersivityFraction()
	 * @generated
	 * @ordered
	 */
	protected double transverseDispersivityFraction = TRANSVERSE_DISPERSIVITY_FRACTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getHotSpotMultiple() <em>Hot Spot Multiple</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHotSpotMultiple()
	 * @generated
	 * @ordered
	 */
	protected static final double HOT_SPOT_MULTIPLE_EDEFAULT = 10.0;

	/**
	 * The cached value of the '{@link #getHotSpotMultiple() <em>Hot Spot Multiple</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHotSpotMultiple()
	 * @generated
	 * @ordered
	 */
	protected double hotSpotMultiple = HOT_SPOT_MULTIPLE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ZoneAnalysisSettingsImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.ZONE_ANALYSIS_SETTINGS;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ZoneEstimatorKind getEstimator() {
		return estimator;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEstimator(ZoneEstimatorKind newEstimator) {
		ZoneEstimatorKind oldEstimator = estimator;
		estimator = newEstimator == null ? ESTIMATOR_EDEFAULT : newEstimator;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__ESTIMATOR, oldEstimator, estimator));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NonDetectValue getNonDetectRule() {
		return nonDetectRule;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNonDetectRule(NonDetectValue newNonDetectRule) {
		NonDetectValue oldNonDetectRule = nonDetectRule;
		nonDetectRule = newNonDetectRule == null ? NON_DETECT_RULE_EDEFAULT : newNonDetectRule;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE, oldNonDetectRule, nonDetectRule));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getInverseDistancePower() {
		return inverseDistancePower;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInverseDistancePower(double newInverseDistancePower) {
		double oldInverseDistancePower = inverseDistancePower;
		inverseDistancePower = newInverseDistancePower;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER, oldInverseDistancePower, inverseDistancePower));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getMaximumNeighbours() {
		return maximumNeighbours;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaximumNeighbours(int newMaximumNeighbours) {
		int oldMaximumNeighbours = maximumNeighbours;
		maximumNeighbours = newMaximumNeighbours;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS, oldMaximumNeighbours, maximumNeighbours));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSearchRadiusMetres() {
		return searchRadiusMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSearchRadiusMetres(double newSearchRadiusMetres) {
		double oldSearchRadiusMetres = searchRadiusMetres;
		searchRadiusMetres = newSearchRadiusMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES, oldSearchRadiusMetres, searchRadiusMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVerticalDistanceFactor() {
		return verticalDistanceFactor;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVerticalDistanceFactor(double newVerticalDistanceFactor) {
		double oldVerticalDistanceFactor = verticalDistanceFactor;
		verticalDistanceFactor = newVerticalDistanceFactor;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR, oldVerticalDistanceFactor, verticalDistanceFactor));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBlockPlanSizeMetres() {
		return blockPlanSizeMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBlockPlanSizeMetres(double newBlockPlanSizeMetres) {
		double oldBlockPlanSizeMetres = blockPlanSizeMetres;
		blockPlanSizeMetres = newBlockPlanSizeMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES, oldBlockPlanSizeMetres, blockPlanSizeMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBlockDepthMetres() {
		return blockDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBlockDepthMetres(double newBlockDepthMetres) {
		double oldBlockDepthMetres = blockDepthMetres;
		blockDepthMetres = newBlockDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES, oldBlockDepthMetres, blockDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public VariogramShapeKind getVariogramModel() {
		return variogramModel;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVariogramModel(VariogramShapeKind newVariogramModel) {
		VariogramShapeKind oldVariogramModel = variogramModel;
		variogramModel = newVariogramModel == null ? VARIOGRAM_MODEL_EDEFAULT : newVariogramModel;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL, oldVariogramModel, variogramModel));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVariogramNuggetMgPerKgSquared() {
		return variogramNuggetMgPerKgSquared;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVariogramNuggetMgPerKgSquared(double newVariogramNuggetMgPerKgSquared) {
		double oldVariogramNuggetMgPerKgSquared = variogramNuggetMgPerKgSquared;
		variogramNuggetMgPerKgSquared = newVariogramNuggetMgPerKgSquared;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED, oldVariogramNuggetMgPerKgSquared, variogramNuggetMgPerKgSquared));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVariogramSillMgPerKgSquared() {
		return variogramSillMgPerKgSquared;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVariogramSillMgPerKgSquared(double newVariogramSillMgPerKgSquared) {
		double oldVariogramSillMgPerKgSquared = variogramSillMgPerKgSquared;
		variogramSillMgPerKgSquared = newVariogramSillMgPerKgSquared;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED, oldVariogramSillMgPerKgSquared, variogramSillMgPerKgSquared));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVariogramRangeMetres() {
		return variogramRangeMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVariogramRangeMetres(double newVariogramRangeMetres) {
		double oldVariogramRangeMetres = variogramRangeMetres;
		variogramRangeMetres = newVariogramRangeMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES, oldVariogramRangeMetres, variogramRangeMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Double> getDelayYears() {
		if (delayYears == null) {
			delayYears = new EDataTypeEList<Double>(Double.class, this, SitePackage.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS);
		}
		return delayYears;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTransverseDispersivityFraction() {
		return transverseDispersivityFraction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTransverseDispersivityFraction(double newTransverseDispersivityFraction) {
		double oldTransverseDispersivityFraction = transverseDispersivityFraction;
		transverseDispersivityFraction = newTransverseDispersivityFraction;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION, oldTransverseDispersivityFraction, transverseDispersivityFraction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getHotSpotMultiple() {
		return hotSpotMultiple;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setHotSpotMultiple(double newHotSpotMultiple) {
		double oldHotSpotMultiple = hotSpotMultiple;
		hotSpotMultiple = newHotSpotMultiple;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE, oldHotSpotMultiple, hotSpotMultiple));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.ZONE_ANALYSIS_SETTINGS__ESTIMATOR:
				return getEstimator();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE:
				return getNonDetectRule();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER:
				return getInverseDistancePower();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS:
				return getMaximumNeighbours();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES:
				return getSearchRadiusMetres();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR:
				return getVerticalDistanceFactor();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES:
				return getBlockPlanSizeMetres();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES:
				return getBlockDepthMetres();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL:
				return getVariogramModel();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED:
				return getVariogramNuggetMgPerKgSquared();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED:
				return getVariogramSillMgPerKgSquared();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES:
				return getVariogramRangeMetres();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS:
				return getDelayYears();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION:
				return getTransverseDispersivityFraction();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE:
				return getHotSpotMultiple();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.ZONE_ANALYSIS_SETTINGS__ESTIMATOR:
				setEstimator((ZoneEstimatorKind)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE:
				setNonDetectRule((NonDetectValue)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER:
				setInverseDistancePower((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS:
				setMaximumNeighbours((Integer)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES:
				setSearchRadiusMetres((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR:
				setVerticalDistanceFactor((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES:
				setBlockPlanSizeMetres((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES:
				setBlockDepthMetres((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL:
				setVariogramModel((VariogramShapeKind)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED:
				setVariogramNuggetMgPerKgSquared((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED:
				setVariogramSillMgPerKgSquared((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES:
				setVariogramRangeMetres((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS:
				getDelayYears().clear();
				getDelayYears().addAll((Collection<? extends Double>)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION:
				setTransverseDispersivityFraction((Double)newValue);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE:
				setHotSpotMultiple((Double)newValue);
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
			case SitePackage.ZONE_ANALYSIS_SETTINGS__ESTIMATOR:
				setEstimator(ESTIMATOR_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE:
				setNonDetectRule(NON_DETECT_RULE_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER:
				setInverseDistancePower(INVERSE_DISTANCE_POWER_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS:
				setMaximumNeighbours(MAXIMUM_NEIGHBOURS_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES:
				setSearchRadiusMetres(SEARCH_RADIUS_METRES_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR:
				setVerticalDistanceFactor(VERTICAL_DISTANCE_FACTOR_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES:
				setBlockPlanSizeMetres(BLOCK_PLAN_SIZE_METRES_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES:
				setBlockDepthMetres(BLOCK_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL:
				setVariogramModel(VARIOGRAM_MODEL_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED:
				setVariogramNuggetMgPerKgSquared(VARIOGRAM_NUGGET_MG_PER_KG_SQUARED_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED:
				setVariogramSillMgPerKgSquared(VARIOGRAM_SILL_MG_PER_KG_SQUARED_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES:
				setVariogramRangeMetres(VARIOGRAM_RANGE_METRES_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS:
				getDelayYears().clear();
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION:
				setTransverseDispersivityFraction(TRANSVERSE_DISPERSIVITY_FRACTION_EDEFAULT);
				return;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE:
				setHotSpotMultiple(HOT_SPOT_MULTIPLE_EDEFAULT);
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
			case SitePackage.ZONE_ANALYSIS_SETTINGS__ESTIMATOR:
				return estimator != ESTIMATOR_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE:
				return nonDetectRule != NON_DETECT_RULE_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER:
				return inverseDistancePower != INVERSE_DISTANCE_POWER_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS:
				return maximumNeighbours != MAXIMUM_NEIGHBOURS_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES:
				return searchRadiusMetres != SEARCH_RADIUS_METRES_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR:
				return verticalDistanceFactor != VERTICAL_DISTANCE_FACTOR_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES:
				return blockPlanSizeMetres != BLOCK_PLAN_SIZE_METRES_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES:
				return blockDepthMetres != BLOCK_DEPTH_METRES_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL:
				return variogramModel != VARIOGRAM_MODEL_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED:
				return variogramNuggetMgPerKgSquared != VARIOGRAM_NUGGET_MG_PER_KG_SQUARED_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED:
				return variogramSillMgPerKgSquared != VARIOGRAM_SILL_MG_PER_KG_SQUARED_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES:
				return variogramRangeMetres != VARIOGRAM_RANGE_METRES_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS:
				return delayYears != null && !delayYears.isEmpty();
			case SitePackage.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION:
				return transverseDispersivityFraction != TRANSVERSE_DISPERSIVITY_FRACTION_EDEFAULT;
			case SitePackage.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE:
				return hotSpotMultiple != HOT_SPOT_MULTIPLE_EDEFAULT;
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
		result.append(" (estimator: ");
		result.append(estimator);
		result.append(", nonDetectRule: ");
		result.append(nonDetectRule);
		result.append(", inverseDistancePower: ");
		result.append(inverseDistancePower);
		result.append(", maximumNeighbours: ");
		result.append(maximumNeighbours);
		result.append(", searchRadiusMetres: ");
		result.append(searchRadiusMetres);
		result.append(", verticalDistanceFactor: ");
		result.append(verticalDistanceFactor);
		result.append(", blockPlanSizeMetres: ");
		result.append(blockPlanSizeMetres);
		result.append(", blockDepthMetres: ");
		result.append(blockDepthMetres);
		result.append(", variogramModel: ");
		result.append(variogramModel);
		result.append(", variogramNuggetMgPerKgSquared: ");
		result.append(variogramNuggetMgPerKgSquared);
		result.append(", variogramSillMgPerKgSquared: ");
		result.append(variogramSillMgPerKgSquared);
		result.append(", variogramRangeMetres: ");
		result.append(variogramRangeMetres);
		result.append(", delayYears: ");
		result.append(delayYears);
		result.append(", transverseDispersivityFraction: ");
		result.append(transverseDispersivityFraction);
		result.append(", hotSpotMultiple: ");
		result.append(hotSpotMultiple);
		result.append(')');
		return result.toString();
	}

} //ZoneAnalysisSettingsImpl
