/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.PriceBook;
import eluvia.site.model.SitePackage;
import eluvia.site.model.TreatmentZone;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Excavation Design</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getZone <em>Zone</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getSoilType <em>Soil Type</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getSideSlopeHorizontalPerVertical <em>Side Slope Horizontal Per Vertical</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getOverdigMetres <em>Overdig Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getTruckHeapedCapacityCubicMetres <em>Truck Heaped Capacity Cubic Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getTruckPayloadKilograms <em>Truck Payload Kilograms</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ExcavationDesignImpl#getPriceBook <em>Price Book</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ExcavationDesignImpl extends MinimalEObjectImpl.Container implements ExcavationDesign {
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
	 * The cached value of the '{@link #getZone() <em>Zone</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getZone()
	 * @generated
	 * @ordered
	 */
	protected TreatmentZone zone;

	/**
	 * The default value of the '{@link #getSoilType() <em>Soil Type</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoilType()
	 * @generated
	 * @ordered
	 */
	protected static final ExcavationSoilType SOIL_TYPE_EDEFAULT = ExcavationSoilType.TYPE_C;

	/**
	 * The cached value of the '{@link #getSoilType() <em>Soil Type</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoilType()
	 * @generated
	 * @ordered
	 */
	protected ExcavationSoilType soilType = SOIL_TYPE_EDEFAULT;

	/**
	 * The default value of the '{@link #getSideSlopeHorizontalPerVertical() <em>Side Slope Horizontal Per Vertical</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSideSlopeHorizontalPerVertical()
	 * @generated
	 * @ordered
	 */
	protected static final double SIDE_SLOPE_HORIZONTAL_PER_VERTICAL_EDEFAULT = 1.5;

	/**
	 * The cached value of the '{@link #getSideSlopeHorizontalPerVertical() <em>Side Slope Horizontal Per Vertical</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSideSlopeHorizontalPerVertical()
	 * @generated
	 * @ordered
	 */
	protected double sideSlopeHorizontalPerVertical = SIDE_SLOPE_HORIZONTAL_PER_VERTICAL_EDEFAULT;

	/**
	 * The default value of the '{@link #getOverdigMetres() <em>Overdig Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOverdigMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double OVERDIG_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getOverdigMetres() <em>Overdig Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOverdigMetres()
	 * @generated
	 * @ordered
	 */
	protected double overdigMetres = OVERDIG_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getTruckHeapedCapacityCubicMetres() <em>Truck Heaped Capacity Cubic Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTruckHeapedCapacityCubicMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double TRUCK_HEAPED_CAPACITY_CUBIC_METRES_EDEFAULT = 15.0;

	/**
	 * The cached value of the '{@link #getTruckHeapedCapacityCubicMetres() <em>Truck Heaped Capacity Cubic Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTruckHeapedCapacityCubicMetres()
	 * @generated
	 * @ordered
	 */
	protected double truckHeapedCapacityCubicMetres = TRUCK_HEAPED_CAPACITY_CUBIC_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getTruckPayloadKilograms() <em>Truck Payload Kilograms</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTruckPayloadKilograms()
	 * @generated
	 * @ordered
	 */
	protected static final double TRUCK_PAYLOAD_KILOGRAMS_EDEFAULT = 20000.0;

	/**
	 * The cached value of the '{@link #getTruckPayloadKilograms() <em>Truck Payload Kilograms</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTruckPayloadKilograms()
	 * @generated
	 * @ordered
	 */
	protected double truckPayloadKilograms = TRUCK_PAYLOAD_KILOGRAMS_EDEFAULT;

	/**
	 * The cached value of the '{@link #getPriceBook() <em>Price Book</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriceBook()
	 * @generated
	 * @ordered
	 */
	protected PriceBook priceBook;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ExcavationDesignImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.EXCAVATION_DESIGN;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TreatmentZone getZone() {
		if (zone != null && zone.eIsProxy()) {
			InternalEObject oldZone = (InternalEObject)zone;
			zone = (TreatmentZone)eResolveProxy(oldZone);
			if (zone != oldZone) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.EXCAVATION_DESIGN__ZONE, oldZone, zone));
			}
		}
		return zone;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TreatmentZone basicGetZone() {
		return zone;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setZone(TreatmentZone newZone) {
		TreatmentZone oldZone = zone;
		zone = newZone;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__ZONE, oldZone, zone));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ExcavationSoilType getSoilType() {
		return soilType;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoilType(ExcavationSoilType newSoilType) {
		ExcavationSoilType oldSoilType = soilType;
		soilType = newSoilType == null ? SOIL_TYPE_EDEFAULT : newSoilType;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__SOIL_TYPE, oldSoilType, soilType));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSideSlopeHorizontalPerVertical() {
		return sideSlopeHorizontalPerVertical;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSideSlopeHorizontalPerVertical(double newSideSlopeHorizontalPerVertical) {
		double oldSideSlopeHorizontalPerVertical = sideSlopeHorizontalPerVertical;
		sideSlopeHorizontalPerVertical = newSideSlopeHorizontalPerVertical;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL, oldSideSlopeHorizontalPerVertical, sideSlopeHorizontalPerVertical));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOverdigMetres() {
		return overdigMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOverdigMetres(double newOverdigMetres) {
		double oldOverdigMetres = overdigMetres;
		overdigMetres = newOverdigMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__OVERDIG_METRES, oldOverdigMetres, overdigMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTruckHeapedCapacityCubicMetres() {
		return truckHeapedCapacityCubicMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTruckHeapedCapacityCubicMetres(double newTruckHeapedCapacityCubicMetres) {
		double oldTruckHeapedCapacityCubicMetres = truckHeapedCapacityCubicMetres;
		truckHeapedCapacityCubicMetres = newTruckHeapedCapacityCubicMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES, oldTruckHeapedCapacityCubicMetres, truckHeapedCapacityCubicMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTruckPayloadKilograms() {
		return truckPayloadKilograms;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTruckPayloadKilograms(double newTruckPayloadKilograms) {
		double oldTruckPayloadKilograms = truckPayloadKilograms;
		truckPayloadKilograms = newTruckPayloadKilograms;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS, oldTruckPayloadKilograms, truckPayloadKilograms));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PriceBook getPriceBook() {
		if (priceBook != null && priceBook.eIsProxy()) {
			InternalEObject oldPriceBook = (InternalEObject)priceBook;
			priceBook = (PriceBook)eResolveProxy(oldPriceBook);
			if (priceBook != oldPriceBook) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.EXCAVATION_DESIGN__PRICE_BOOK, oldPriceBook, priceBook));
			}
		}
		return priceBook;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public PriceBook basicGetPriceBook() {
		return priceBook;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPriceBook(PriceBook newPriceBook) {
		PriceBook oldPriceBook = priceBook;
		priceBook = newPriceBook;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.EXCAVATION_DESIGN__PRICE_BOOK, oldPriceBook, priceBook));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.EXCAVATION_DESIGN__NAME:
				return getName();
			case SitePackage.EXCAVATION_DESIGN__ZONE:
				if (resolve) return getZone();
				return basicGetZone();
			case SitePackage.EXCAVATION_DESIGN__SOIL_TYPE:
				return getSoilType();
			case SitePackage.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL:
				return getSideSlopeHorizontalPerVertical();
			case SitePackage.EXCAVATION_DESIGN__OVERDIG_METRES:
				return getOverdigMetres();
			case SitePackage.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES:
				return getTruckHeapedCapacityCubicMetres();
			case SitePackage.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS:
				return getTruckPayloadKilograms();
			case SitePackage.EXCAVATION_DESIGN__PRICE_BOOK:
				if (resolve) return getPriceBook();
				return basicGetPriceBook();
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
			case SitePackage.EXCAVATION_DESIGN__NAME:
				setName((String)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__ZONE:
				setZone((TreatmentZone)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__SOIL_TYPE:
				setSoilType((ExcavationSoilType)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL:
				setSideSlopeHorizontalPerVertical((Double)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__OVERDIG_METRES:
				setOverdigMetres((Double)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES:
				setTruckHeapedCapacityCubicMetres((Double)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS:
				setTruckPayloadKilograms((Double)newValue);
				return;
			case SitePackage.EXCAVATION_DESIGN__PRICE_BOOK:
				setPriceBook((PriceBook)newValue);
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
			case SitePackage.EXCAVATION_DESIGN__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.EXCAVATION_DESIGN__ZONE:
				setZone((TreatmentZone)null);
				return;
			case SitePackage.EXCAVATION_DESIGN__SOIL_TYPE:
				setSoilType(SOIL_TYPE_EDEFAULT);
				return;
			case SitePackage.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL:
				setSideSlopeHorizontalPerVertical(SIDE_SLOPE_HORIZONTAL_PER_VERTICAL_EDEFAULT);
				return;
			case SitePackage.EXCAVATION_DESIGN__OVERDIG_METRES:
				setOverdigMetres(OVERDIG_METRES_EDEFAULT);
				return;
			case SitePackage.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES:
				setTruckHeapedCapacityCubicMetres(TRUCK_HEAPED_CAPACITY_CUBIC_METRES_EDEFAULT);
				return;
			case SitePackage.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS:
				setTruckPayloadKilograms(TRUCK_PAYLOAD_KILOGRAMS_EDEFAULT);
				return;
			case SitePackage.EXCAVATION_DESIGN__PRICE_BOOK:
				setPriceBook((PriceBook)null);
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
			case SitePackage.EXCAVATION_DESIGN__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.EXCAVATION_DESIGN__ZONE:
				return zone != null;
			case SitePackage.EXCAVATION_DESIGN__SOIL_TYPE:
				return soilType != SOIL_TYPE_EDEFAULT;
			case SitePackage.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL:
				return sideSlopeHorizontalPerVertical != SIDE_SLOPE_HORIZONTAL_PER_VERTICAL_EDEFAULT;
			case SitePackage.EXCAVATION_DESIGN__OVERDIG_METRES:
				return overdigMetres != OVERDIG_METRES_EDEFAULT;
			case SitePackage.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES:
				return truckHeapedCapacityCubicMetres != TRUCK_HEAPED_CAPACITY_CUBIC_METRES_EDEFAULT;
			case SitePackage.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS:
				return truckPayloadKilograms != TRUCK_PAYLOAD_KILOGRAMS_EDEFAULT;
			case SitePackage.EXCAVATION_DESIGN__PRICE_BOOK:
				return priceBook != null;
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
		result.append(", soilType: ");
		result.append(soilType);
		result.append(", sideSlopeHorizontalPerVertical: ");
		result.append(sideSlopeHorizontalPerVertical);
		result.append(", overdigMetres: ");
		result.append(overdigMetres);
		result.append(", truckHeapedCapacityCubicMetres: ");
		result.append(truckHeapedCapacityCubicMetres);
		result.append(", truckPayloadKilograms: ");
		result.append(truckPayloadKilograms);
		result.append(')');
		return result.toString();
	}

} //ExcavationDesignImpl
