/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.ColumnTest;
import eluvia.site.model.ColumnTestKind;
import eluvia.site.model.ColumnTestPoint;
import eluvia.site.model.Contaminant;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Column Test</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getLayer <em>Layer</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getColumnLengthMetres <em>Column Length Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getWaterContent <em>Water Content</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getReferenceConcentrationMilligramsPerLitre <em>Reference Concentration Milligrams Per Litre</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestImpl#getPoints <em>Points</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ColumnTestImpl extends MinimalEObjectImpl.Container implements ColumnTest {
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
	 * The cached value of the '{@link #getContaminant() <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContaminant()
	 * @generated
	 * @ordered
	 */
	protected Contaminant contaminant;

	/**
	 * The cached value of the '{@link #getLayer() <em>Layer</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLayer()
	 * @generated
	 * @ordered
	 */
	protected SoilLayer layer;

	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final ColumnTestKind KIND_EDEFAULT = ColumnTestKind.BREAKTHROUGH;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected ColumnTestKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getColumnLengthMetres() <em>Column Length Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getColumnLengthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double COLUMN_LENGTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getColumnLengthMetres() <em>Column Length Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getColumnLengthMetres()
	 * @generated
	 * @ordered
	 */
	protected double columnLengthMetres = COLUMN_LENGTH_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getDarcyFluxMetresPerDay() <em>Darcy Flux Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDarcyFluxMetresPerDay()
	 * @generated
	 * @ordered
	 */
	protected static final double DARCY_FLUX_METRES_PER_DAY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDarcyFluxMetresPerDay() <em>Darcy Flux Metres Per Day</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDarcyFluxMetresPerDay()
	 * @generated
	 * @ordered
	 */
	protected double darcyFluxMetresPerDay = DARCY_FLUX_METRES_PER_DAY_EDEFAULT;

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
	 * The default value of the '{@link #getReferenceConcentrationMilligramsPerLitre() <em>Reference Concentration Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReferenceConcentrationMilligramsPerLitre()
	 * @generated
	 * @ordered
	 */
	protected static final double REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getReferenceConcentrationMilligramsPerLitre() <em>Reference Concentration Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReferenceConcentrationMilligramsPerLitre()
	 * @generated
	 * @ordered
	 */
	protected double referenceConcentrationMilligramsPerLitre = REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE_EDEFAULT;

	/**
	 * The cached value of the '{@link #getPoints() <em>Points</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoints()
	 * @generated
	 * @ordered
	 */
	protected EList<ColumnTestPoint> points;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ColumnTestImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.COLUMN_TEST;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Contaminant getContaminant() {
		if (contaminant != null && contaminant.eIsProxy()) {
			InternalEObject oldContaminant = (InternalEObject)contaminant;
			contaminant = (Contaminant)eResolveProxy(oldContaminant);
			if (contaminant != oldContaminant) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.COLUMN_TEST__CONTAMINANT, oldContaminant, contaminant));
			}
		}
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Contaminant basicGetContaminant() {
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContaminant(Contaminant newContaminant) {
		Contaminant oldContaminant = contaminant;
		contaminant = newContaminant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__CONTAMINANT, oldContaminant, contaminant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SoilLayer getLayer() {
		if (layer != null && layer.eIsProxy()) {
			InternalEObject oldLayer = (InternalEObject)layer;
			layer = (SoilLayer)eResolveProxy(oldLayer);
			if (layer != oldLayer) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.COLUMN_TEST__LAYER, oldLayer, layer));
			}
		}
		return layer;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SoilLayer basicGetLayer() {
		return layer;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLayer(SoilLayer newLayer) {
		SoilLayer oldLayer = layer;
		layer = newLayer;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__LAYER, oldLayer, layer));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ColumnTestKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(ColumnTestKind newKind) {
		ColumnTestKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getColumnLengthMetres() {
		return columnLengthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setColumnLengthMetres(double newColumnLengthMetres) {
		double oldColumnLengthMetres = columnLengthMetres;
		columnLengthMetres = newColumnLengthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__COLUMN_LENGTH_METRES, oldColumnLengthMetres, columnLengthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDarcyFluxMetresPerDay() {
		return darcyFluxMetresPerDay;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDarcyFluxMetresPerDay(double newDarcyFluxMetresPerDay) {
		double oldDarcyFluxMetresPerDay = darcyFluxMetresPerDay;
		darcyFluxMetresPerDay = newDarcyFluxMetresPerDay;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY, oldDarcyFluxMetresPerDay, darcyFluxMetresPerDay));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__WATER_CONTENT, oldWaterContent, waterContent));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE, oldBulkDensityKgPerCubicMetre, bulkDensityKgPerCubicMetre));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getReferenceConcentrationMilligramsPerLitre() {
		return referenceConcentrationMilligramsPerLitre;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReferenceConcentrationMilligramsPerLitre(double newReferenceConcentrationMilligramsPerLitre) {
		double oldReferenceConcentrationMilligramsPerLitre = referenceConcentrationMilligramsPerLitre;
		referenceConcentrationMilligramsPerLitre = newReferenceConcentrationMilligramsPerLitre;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE, oldReferenceConcentrationMilligramsPerLitre, referenceConcentrationMilligramsPerLitre));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<ColumnTestPoint> getPoints() {
		if (points == null) {
			points = new EObjectContainmentEList<ColumnTestPoint>(ColumnTestPoint.class, this, SitePackage.COLUMN_TEST__POINTS);
		}
		return points;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.COLUMN_TEST__POINTS:
				return ((InternalEList<?>)getPoints()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.COLUMN_TEST__NAME:
				return getName();
			case SitePackage.COLUMN_TEST__CONTAMINANT:
				if (resolve) return getContaminant();
				return basicGetContaminant();
			case SitePackage.COLUMN_TEST__LAYER:
				if (resolve) return getLayer();
				return basicGetLayer();
			case SitePackage.COLUMN_TEST__KIND:
				return getKind();
			case SitePackage.COLUMN_TEST__COLUMN_LENGTH_METRES:
				return getColumnLengthMetres();
			case SitePackage.COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY:
				return getDarcyFluxMetresPerDay();
			case SitePackage.COLUMN_TEST__WATER_CONTENT:
				return getWaterContent();
			case SitePackage.COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE:
				return getBulkDensityKgPerCubicMetre();
			case SitePackage.COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE:
				return getReferenceConcentrationMilligramsPerLitre();
			case SitePackage.COLUMN_TEST__POINTS:
				return getPoints();
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
			case SitePackage.COLUMN_TEST__NAME:
				setName((String)newValue);
				return;
			case SitePackage.COLUMN_TEST__CONTAMINANT:
				setContaminant((Contaminant)newValue);
				return;
			case SitePackage.COLUMN_TEST__LAYER:
				setLayer((SoilLayer)newValue);
				return;
			case SitePackage.COLUMN_TEST__KIND:
				setKind((ColumnTestKind)newValue);
				return;
			case SitePackage.COLUMN_TEST__COLUMN_LENGTH_METRES:
				setColumnLengthMetres((Double)newValue);
				return;
			case SitePackage.COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY:
				setDarcyFluxMetresPerDay((Double)newValue);
				return;
			case SitePackage.COLUMN_TEST__WATER_CONTENT:
				setWaterContent((Double)newValue);
				return;
			case SitePackage.COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE:
				setBulkDensityKgPerCubicMetre((Double)newValue);
				return;
			case SitePackage.COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE:
				setReferenceConcentrationMilligramsPerLitre((Double)newValue);
				return;
			case SitePackage.COLUMN_TEST__POINTS:
				getPoints().clear();
				getPoints().addAll((Collection<? extends ColumnTestPoint>)newValue);
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
			case SitePackage.COLUMN_TEST__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__CONTAMINANT:
				setContaminant((Contaminant)null);
				return;
			case SitePackage.COLUMN_TEST__LAYER:
				setLayer((SoilLayer)null);
				return;
			case SitePackage.COLUMN_TEST__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__COLUMN_LENGTH_METRES:
				setColumnLengthMetres(COLUMN_LENGTH_METRES_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY:
				setDarcyFluxMetresPerDay(DARCY_FLUX_METRES_PER_DAY_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__WATER_CONTENT:
				setWaterContent(WATER_CONTENT_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE:
				setBulkDensityKgPerCubicMetre(BULK_DENSITY_KG_PER_CUBIC_METRE_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE:
				setReferenceConcentrationMilligramsPerLitre(REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST__POINTS:
				getPoints().clear();
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
			case SitePackage.COLUMN_TEST__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.COLUMN_TEST__CONTAMINANT:
				return contaminant != null;
			case SitePackage.COLUMN_TEST__LAYER:
				return layer != null;
			case SitePackage.COLUMN_TEST__KIND:
				return kind != KIND_EDEFAULT;
			case SitePackage.COLUMN_TEST__COLUMN_LENGTH_METRES:
				return columnLengthMetres != COLUMN_LENGTH_METRES_EDEFAULT;
			case SitePackage.COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY:
				return darcyFluxMetresPerDay != DARCY_FLUX_METRES_PER_DAY_EDEFAULT;
			case SitePackage.COLUMN_TEST__WATER_CONTENT:
				return waterContent != WATER_CONTENT_EDEFAULT;
			case SitePackage.COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE:
				return bulkDensityKgPerCubicMetre != BULK_DENSITY_KG_PER_CUBIC_METRE_EDEFAULT;
			case SitePackage.COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE:
				return referenceConcentrationMilligramsPerLitre != REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE_EDEFAULT;
			case SitePackage.COLUMN_TEST__POINTS:
				return points != null && !points.isEmpty();
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
		result.append(", kind: ");
		result.append(kind);
		result.append(", columnLengthMetres: ");
		result.append(columnLengthMetres);
		result.append(", darcyFluxMetresPerDay: ");
		result.append(darcyFluxMetresPerDay);
		result.append(", waterContent: ");
		result.append(waterContent);
		result.append(", bulkDensityKgPerCubicMetre: ");
		result.append(bulkDensityKgPerCubicMetre);
		result.append(", referenceConcentrationMilligramsPerLitre: ");
		result.append(referenceConcentrationMilligramsPerLitre);
		result.append(')');
		return result.toString();
	}

} //ColumnTestImpl
