export declare const NEW_PASSWORD_MIN = 10;
/** An e-mail address, trimmed and lower-cased the way users.email is stored. */
export declare const EmailField: () => <TFunction extends Function, Y>(target: TFunction | object, propertyKey?: string | symbol, descriptor?: TypedPropertyDescriptor<Y>) => void;
/** A password someone is choosing now. */
export declare const NewPasswordField: () => <TFunction extends Function, Y>(target: TFunction | object, propertyKey?: string | symbol, descriptor?: TypedPropertyDescriptor<Y>) => void;
/** A token from a mailed link. */
export declare const LinkTokenField: () => <TFunction extends Function, Y>(target: TFunction | object, propertyKey?: string | symbol, descriptor?: TypedPropertyDescriptor<Y>) => void;
